import { useState } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { Box, Button, Grid, Link, Stack } from '@mui/material';
import HardwareOutlined from '@mui/icons-material/HardwareOutlined';
import { paths } from '../../config/paths';
import { PageHeader } from '../../components/layout/page-header';
import { PrintButton } from '../../components/print/print-button';
import { CsvDownloads } from '../../components/export/csv-downloads';
import { LoadingState } from '../../components/states/loading-state';
import { ErrorState } from '../../components/states/error-state';
import { useMe } from '../../lib/session/get-me';
import { canRecord } from '../../lib/session/roles';
import { useMachine } from '../../features/machines/api/get-machine';
import { useTargetSets } from '../../features/target-sets/api/get-target-sets';
import { useRail } from '../../features/rails/api/get-rail';
import { useRails } from '../../features/rails/api/get-rails';
import { useSweeps } from '../../features/rails/api/get-sweeps';
import { CheckStatusChip } from '../../features/rails/components/check-status-chip';
import { PairParallelismSummary } from '../../features/rails/components/pair-parallelism-summary';
import { RailActions } from '../../features/rails/components/rail-actions';
import { RailGeometry } from '../../features/rails/components/rail-geometry';
import { SweepEntry } from '../../features/rails/components/sweep-entry';
import { SweepHistory } from '../../features/rails/components/sweep-history';
import { SweepResult } from '../../features/rails/components/sweep-result';
import type { Sweep } from '../../features/rails/types';
import { EvidencePanel } from '../../features/evidence/components/evidence-panel';

export default function RailRoute() {
  const { machineId = '', railId = '' } = useParams();
  const me = useMe();
  const machine = useMachine(machineId);
  const rail = useRail(railId);
  const rails = useRails(machineId);
  const sweeps = useSweeps(railId);
  const sets = useTargetSets();
  const [saved, setSaved] = useState<Sweep | null>(null);

  if (rail.isPending || machine.isPending) return <LoadingState label="Opening the rail…" />;
  if (rail.isError) return <ErrorState error={rail.error} onRetry={() => rail.refetch()} />;
  if (machine.isError) return <ErrorState error={machine.error} onRetry={() => machine.refetch()} />;
  const r = rail.data;
  const m = machine.data;
  const recorder = canRecord(me.data?.role);
  const partner = rails.data?.find((x) => x.id === r.partnerRailId) ?? null;
  const target = sets.data?.find((s) => s.id === m.targetSet.id)?.targets.railStraightness ?? null;
  const latest = sweeps.data?.[0];
  const railsTab = `${paths.machine(machineId)}?tab=rails`;

  const actions = (
    <>
      {recorder && <RailActions rail={r} others={rails.data ?? []} afterDelete={railsTab} />}
      {/* Bolt-down guide: its link or button goes here, beside the rail's own actions. */}
      <Button
        component={RouterLink}
        to={paths.boltDown(machineId, railId)}
        variant="outlined"
        startIcon={<HardwareOutlined />}
      >
        Bolt-down guide
      </Button>
    </>
  );

  return (
    <>
      <PageHeader
        title={`Rail ${r.label}`}
        subtitle={
          <>
            <Link component={RouterLink} to={railsTab}>
              {m.name}
            </Link>{' '}
            · axis {r.axis} · {r.lengthMm} mm · target{' '}
            {target ? `${target.value} ${target.unit === 'um' ? 'µm' : target.unit}` : '…'} straightness (
            {m.targetSet.name})
          </>
        }
        actions={
          <>
            <CheckStatusChip status={latest ? latest.status : 'not-started'} size="medium" />
            <PrintButton what={`rail ${r.label}`} />
            <CsvDownloads files={[{ label: `Sweeps of rail ${r.label}`, href: `/api/rails/${r.id}/sweeps.csv` }]} />
          </>
        }
      />
      <Stack spacing={2.5}>
        <Grid container spacing={2.5}>
          <Grid size={{ xs: 12, md: partner ? 7 : 12 }}>
            <RailGeometry rail={r} partnerLabel={partner?.label ?? null} actions={actions} />
          </Grid>
          {partner && (
            <Grid size={{ xs: 12, md: 5 }}>
              <PairParallelismSummary
                railId={r.id}
                title={`Parallel with ${partner.label}`}
                partnerLabel={partner.label}
              />
            </Grid>
          )}
        </Grid>
        {recorder && (
          <Box data-print="hide">
            <SweepEntry key={r.id} rail={r} target={target} takenBy={me.data?.name ?? ''} onSaved={setSaved} />
          </Box>
        )}
        {saved && <SweepResult sweep={saved} title="Sweep saved" />}
        {sweeps.isError && <ErrorState error={sweeps.error} onRetry={() => sweeps.refetch()} />}
        {sweeps.data && <SweepHistory sweeps={sweeps.data} canRecord={recorder} />}
        <EvidencePanel
          subjectType="rail"
          subjectId={r.id}
          title="Photos and files of this rail"
          what={`rail ${r.label}`}
        />
      </Stack>
    </>
  );
}
