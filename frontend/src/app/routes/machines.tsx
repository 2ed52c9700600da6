import { useState } from 'react';
import { Button } from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import { PageHeader } from '../../components/layout/page-header';
import { LoadingState } from '../../components/states/loading-state';
import { ErrorState } from '../../components/states/error-state';
import { EmptyState } from '../../components/states/empty-state';
import { useMe } from '../../lib/session/get-me';
import { canRecord } from '../../lib/session/roles';
import { useMachines } from '../../features/machines/api/get-machines';
import { MachinesTable } from '../../features/machines/components/machines-table';
import { NewMachineDialog } from '../../features/machines/components/new-machine-dialog';

export default function MachinesRoute() {
  const machines = useMachines();
  const me = useMe();
  const [open, setOpen] = useState(false);
  const mayCreate = canRecord(me.data?.role);
  const newButton = mayCreate && (
    <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setOpen(true)}>
      New machine
    </Button>
  );
  return (
    <>
      <PageHeader title="Machines" subtitle="Every machine file of the workshop" actions={newButton} />
      {machines.isPending && <LoadingState label="Loading machines…" />}
      {machines.isError && <ErrorState error={machines.error} onRetry={() => machines.refetch()} />}
      {machines.data &&
        (machines.data.length ? (
          <MachinesTable machines={machines.data} />
        ) : (
          <EmptyState title="No machines yet" action={newButton || undefined}>
            Open a machine file to start its commissioning record.
          </EmptyState>
        ))}
      {mayCreate && <NewMachineDialog open={open} onClose={() => setOpen(false)} />}
    </>
  );
}
