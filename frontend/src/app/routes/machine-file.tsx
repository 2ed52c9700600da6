import type { ReactNode } from 'react';
import { useParams, useSearchParams } from 'react-router-dom';
import { Box, Tab, Tabs } from '@mui/material';
import { PageHeader } from '../../components/layout/page-header';
import { LoadingState } from '../../components/states/loading-state';
import { ErrorState } from '../../components/states/error-state';
import { useMachine } from '../../features/machines/api/get-machine';
import { MachineOverview } from '../../features/machines/components/machine-overview';
import { MachineHistory } from '../../features/machines/components/machine-history';
import { MachineStateChip } from '../../features/machines/components/machine-state-chip';
import { KIND_LABELS, type Machine } from '../../features/machines/types';
import { ReadinessBoard } from '../../features/approvals/components/readiness-board';
import { RailsPanel } from '../../features/rails/components/rails-panel';
import { MachineEvidence } from '../../features/evidence/components/machine-evidence';
import { FramePanel } from '../../features/frame/components/frame-panel';
import { SafetyWalkPanel } from '../../features/safety/components/safety-walk-panel';
import { DrivesPanel } from '../../features/drives/components/drives-panel';
import { HolePatternsPanel } from '../../features/hole-patterns/components/hole-patterns-panel';

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

  if (machine.isPending) return <LoadingState label="Opening the machine file…" />;
  if (machine.isError) return <ErrorState error={machine.error} onRetry={() => machine.refetch()} />;
  const m = machine.data;
  const section = SECTIONS.find((s) => s.id === tab)!;

  return (
    <>
      <PageHeader
        title={m.name}
        subtitle={`${KIND_LABELS[m.kind]} · work area ${m.workArea.x} × ${m.workArea.y} mm · ${m.targetSet.name}`}
        actions={<MachineStateChip state={m.state} />}
      />
      <Box sx={{ borderBottom: 1, borderColor: 'divider', mb: 2 }}>
        <Tabs value={tab} onChange={(_, v) => setParams({ tab: v }, { replace: true })} variant="scrollable" allowScrollButtonsMobile aria-label="Machine file sections">
          {SECTIONS.map((s) => (
            <Tab key={s.id} value={s.id} label={s.label} />
          ))}
        </Tabs>
      </Box>
      {section.render(m)}
    </>
  );
}
