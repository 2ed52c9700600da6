import { useState } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { Alert, Box, Button, Link, Stack } from '@mui/material';
import ArrowBack from '@mui/icons-material/ArrowBack';
import EditOutlined from '@mui/icons-material/EditOutlined';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import { PageHeader } from '../../components/layout/page-header';
import { PrintButton } from '../../components/print/print-button';
import { CsvDownloads } from '../../components/export/csv-downloads';
import { ErrorState } from '../../components/states/error-state';
import { LoadingState } from '../../components/states/loading-state';
import { paths } from '../../config/paths';
import { useMe } from '../../lib/session/get-me';
import { canCalibrate } from '../../lib/session/roles';
import { useMachine } from '../../features/machines/api/get-machine';
import { useAxis } from '../../features/drives/api/get-axis';
import { AxisFormDialog } from '../../features/drives/components/axis-form-dialog';
import { AxisSummary } from '../../features/drives/components/axis-summary';
import { BacklashSection } from '../../features/drives/components/backlash-section';
import { PositioningSection } from '../../features/drives/components/positioning-section';
import { SpeedCheckCard } from '../../features/drives/components/speed-check-card';
import { TestProgramDialog } from '../../features/drives/components/test-program-dialog';
import { TravelTrialSection } from '../../features/drives/components/travel-trial-section';
import { EvidencePanel } from '../../features/evidence/components/evidence-panel';

export default function AxisRoute() {
  const { machineId = '', axisId = '' } = useParams();
  const axis = useAxis(axisId);
  const machine = useMachine(machineId);
  const me = useMe();
  const mayRecord = canCalibrate(me.data?.role);
  const [editing, setEditing] = useState(false);
  const [program, setProgram] = useState(false);

  if (axis.isPending) return <LoadingState label="Opening the axis…" />;
  if (axis.isError) return <ErrorState error={axis.error} onRetry={() => axis.refetch()} />;
  const a = axis.data;
  return (
    <>
      <Link
        component={RouterLink}
        to={`${paths.machine(machineId)}?tab=drives`}
        sx={{ display: 'inline-flex', alignItems: 'center', gap: 0.5, mb: 1, minHeight: { xs: 44, md: 'auto' } }}
      >
        <ArrowBack fontSize="small" /> {machine.data?.name ?? 'Machine file'} · Drives
      </Link>
      <PageHeader
        title={`Axis ${a.name}`}
        subtitle={a.driveSummary}
        actions={
          <>
            <PrintButton what={`axis ${a.name}`} />
            <CsvDownloads
              files={[
                { label: `Travel trials of axis ${a.name}`, href: `/api/axes/${a.id}/travel-trials.csv` },
                { label: `Repeat-and-reverse runs of axis ${a.name}`, href: `/api/axes/${a.id}/positioning-runs.csv` },
              ]}
            />
            <Button variant="outlined" startIcon={<FileDownloadOutlined />} onClick={() => setProgram(true)}>
              Download test program
            </Button>
            {mayRecord && (
              <Button
                variant="outlined"
                startIcon={<EditOutlined />}
                onClick={() => setEditing(true)}
                disabled={a.locked}
              >
                Edit axis
              </Button>
            )}
          </>
        }
      />
      <Stack spacing={3}>
        {a.locked && (
          <Alert severity="info">
            An approval was based on this axis's drive record, so the drive can no longer be edited. A correction from a
            new travel trial can still be applied; the old value stays in the history.
          </Alert>
        )}
        <AxisSummary axis={a} />
        <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', lg: '2fr 1fr' }, gap: 3, alignItems: 'start' }}>
          <TravelTrialSection axis={a} mayRecord={mayRecord} />
          <Box sx={{ pt: { lg: 6 } }}>
            <SpeedCheckCard axis={a} />
          </Box>
        </Box>
        <PositioningSection axis={a} mayRecord={mayRecord} />
        <BacklashSection axis={a} mayRecord={mayRecord} />
        <EvidencePanel
          subjectType="axis"
          subjectId={a.id}
          title="Photos and files of this axis"
          what={`axis ${a.name}`}
        />
      </Stack>
      {mayRecord && <AxisFormDialog machineId={machineId} axis={a} open={editing} onClose={() => setEditing(false)} />}
      <TestProgramDialog axis={a} open={program} onClose={() => setProgram(false)} />
    </>
  );
}
