import { UNIT_LABELS } from '../../lib/units';
import { lazy, Suspense, useEffect, type ReactNode } from 'react';
import { useParams, useSearchParams } from 'react-router-dom';
import { useQueryClient } from '@tanstack/react-query';
import { Box, Tab, Tabs, Typography } from '@mui/material';
import { PageHeader } from '../../components/layout/page-header';
import { PrintButton } from '../../components/print/print-button';
import { CsvDownloads } from '../../components/export/csv-downloads';
import { LoadingState } from '../../components/states/loading-state';
import { ErrorState } from '../../components/states/error-state';
import { useMachine } from '../../features/machines/api/get-machine';
import { MachineStateChip } from '../../features/machines/components/machine-state-chip';
import { KIND_LABELS, type Machine } from '../../features/machines/types';
import { readinessQueryOptions } from '../../features/approvals/api/get-readiness';

// Each tab's code loads when the tab opens: the file opens on readiness without the charts,
// grids and forms of the other tabs.
const loadReadinessBoard = () => import('../../features/approvals/components/readiness-board');
const ReadinessBoard = lazy(() => loadReadinessBoard().then((m) => ({ default: m.ReadinessBoard })));
const MachineOverview = lazy(() =>
  import('../../features/machines/components/machine-overview').then((m) => ({ default: m.MachineOverview })),
);
const RailsPanel = lazy(() =>
  import('../../features/rails/components/rails-panel').then((m) => ({ default: m.RailsPanel })),
);
const DrivesPanel = lazy(() =>
  import('../../features/drives/components/drives-panel').then((m) => ({ default: m.DrivesPanel })),
);
const FramePanel = lazy(() =>
  import('../../features/frame/components/frame-panel').then((m) => ({ default: m.FramePanel })),
);
const SafetyWalkPanel = lazy(() =>
  import('../../features/safety/components/safety-walk-panel').then((m) => ({ default: m.SafetyWalkPanel })),
);
const MachineEvidence = lazy(() =>
  import('../../features/evidence/components/machine-evidence').then((m) => ({ default: m.MachineEvidence })),
);
const HolePatternsPanel = lazy(() =>
  import('../../features/hole-patterns/components/hole-patterns-panel').then((m) => ({ default: m.HolePatternsPanel })),
);
const MachineHistory = lazy(() =>
  import('../../features/machines/components/machine-history').then((m) => ({ default: m.MachineHistory })),
);

interface Section {
  id: string;
  label: string;
  render: (machine: Machine) => ReactNode;
}

// The machine file's sections; each feature adds its own tab here.
const SECTIONS: Section[] = [
  { id: 'readiness', label: 'Readiness', render: (m) => <ReadinessBoard machineId={m.id} machineName={m.name} /> },
  { id: 'overview', label: 'Specification', render: (m) => <MachineOverview machine={m} /> },
  { id: 'rails', label: 'Rails', render: (m) => <RailsPanel machineId={m.id} /> },
  { id: 'drives', label: 'Drives', render: (m) => <DrivesPanel machineId={m.id} /> },
  { id: 'frame', label: 'Frame', render: (m) => <FramePanel machine={m} /> },
  { id: 'safety', label: 'Safety walk', render: (m) => <SafetyWalkPanel machineId={m.id} /> },
  { id: 'templates', label: 'Templates', render: (m) => <HolePatternsPanel machineId={m.id} /> },
  { id: 'evidence', label: 'Evidence', render: (m) => <MachineEvidence machineId={m.id} /> },
  { id: 'history', label: 'History', render: (m) => <MachineHistory machineId={m.id} /> },
];

export default function MachineFileRoute() {
  const { machineId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const machine = useMachine(machineId);
  const tab = SECTIONS.some((s) => s.id === params.get('tab')) ? params.get('tab')! : SECTIONS[0].id;
  const queryClient = useQueryClient();
  // The file opens on readiness: fetch its code and its data alongside the machine, not after it.
  useEffect(() => {
    if (tab !== 'readiness' || !machineId) return;
    void loadReadinessBoard();
    void queryClient.prefetchQuery(readinessQueryOptions(machineId));
  }, [tab, machineId, queryClient]);

  if (machine.isPending) return <LoadingState label="Opening the machine file…" />;
  if (machine.isError) return <ErrorState error={machine.error} onRetry={() => machine.refetch()} />;
  const m = machine.data;
  const section = SECTIONS.find((s) => s.id === tab)!;

  return (
    <>
      <PageHeader
        title={m.name}
        subtitle={`${KIND_LABELS[m.kind]} · work area ${m.workAreaInLengthUnit.x} × ${m.workAreaInLengthUnit.y} ${UNIT_LABELS[m.lengthUnit]} · ${m.targetSet.name}`}
        actions={
          <>
            <MachineStateChip state={m.state} />
            <PrintButton what={`${section.label.toLowerCase()} of ${m.name}`} />
            <CsvDownloads
              text="Bed grids CSV"
              files={[{ label: `Bed grids of ${m.name}`, href: `/api/machines/${m.id}/bed-grids.csv` }]}
            />
          </>
        }
      />
      <Box sx={{ borderBottom: 1, borderColor: 'divider', mb: 2 }}>
        <Tabs
          value={tab}
          onChange={(_, v) => setParams({ tab: v }, { replace: true })}
          variant="scrollable"
          allowScrollButtonsMobile
          aria-label="Machine file sections"
        >
          {SECTIONS.map((s) => (
            <Tab key={s.id} value={s.id} label={s.label} />
          ))}
        </Tabs>
      </Box>
      <Typography data-print="only" variant="h2" sx={{ mb: 2 }}>
        {section.label}
      </Typography>
      <Suspense fallback={<LoadingState label={`Opening ${section.label.toLowerCase()}…`} />}>
        {section.render(m)}
      </Suspense>
    </>
  );
}
