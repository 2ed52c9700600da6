import { Link as RouterLink, useParams } from 'react-router-dom';
import { Breadcrumbs, Link, Typography } from '@mui/material';
import { PageHeader } from '../../components/layout/page-header';
import { LoadingState } from '../../components/states/loading-state';
import { ErrorState } from '../../components/states/error-state';
import { paths } from '../../config/paths';
import { useMe } from '../../lib/session/get-me';
import { canRecord } from '../../lib/session/roles';
import { useMachine } from '../../features/machines/api/get-machine';
import { useRailSummary } from '../../features/bolt-down/api/get-rail';
import { BoltDownScreen } from '../../features/bolt-down/components/bolt-down-screen';

export default function BoltDownRoute() {
  const { machineId = '', railId = '' } = useParams();
  const machine = useMachine(machineId);
  const rail = useRailSummary(railId);
  const me = useMe();

  if (rail.isPending) return <LoadingState label="Opening the bolt-down guide…" />;
  if (!rail.data) return <ErrorState error={rail.error} onRetry={() => rail.refetch()} />;
  const r = rail.data;
  return (
    <>
      <Breadcrumbs sx={{ mb: 1 }}>
        <Link component={RouterLink} to={paths.machines}>
          Machines
        </Link>
        <Link component={RouterLink} to={`${paths.machine(machineId)}?tab=rails`}>
          {machine.data?.name ?? 'Machine file'}
        </Link>
        <Link component={RouterLink} to={paths.rail(machineId, railId)}>
          Rail {r.label}
        </Link>
        <Typography color="text.primary">Bolt-down guide</Typography>
      </Breadcrumbs>
      <PageHeader
        title={`Bolt-down guide · ${r.label}`}
        subtitle={`${machine.data?.name ?? ''} · ${r.axis} rail, ${r.lengthMm} mm, ${r.holes.length} holes`}
      />
      <BoltDownScreen rail={r} canRecord={canRecord(me.data?.role)} />
    </>
  );
}
