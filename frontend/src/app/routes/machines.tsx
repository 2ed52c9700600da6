import { PageHeader } from '../../components/layout/page-header';
import { LoadingState } from '../../components/states/loading-state';
import { ErrorState } from '../../components/states/error-state';
import { EmptyState } from '../../components/states/empty-state';
import { useMachines } from '../../features/machines/api/get-machines';
import { MachinesTable } from '../../features/machines/components/machines-table';

export default function MachinesRoute() {
  const machines = useMachines();
  return (
    <>
      <PageHeader title="Machines" subtitle="Every machine file of the workshop" />
      {machines.isPending && <LoadingState label="Loading machines…" />}
      {machines.isError && <ErrorState error={machines.error} onRetry={() => machines.refetch()} />}
      {machines.data && (machines.data.length ? <MachinesTable machines={machines.data} /> : <EmptyState title="No machines yet">Open a machine file to start its commissioning record.</EmptyState>)}
    </>
  );
}
