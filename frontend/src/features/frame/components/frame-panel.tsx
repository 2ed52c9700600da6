import { Stack } from '@mui/material';
import { useMe } from '../../../lib/session/get-me';
import { canCalibrate, canRecord } from '../../../lib/session/roles';
import { BedGridSection } from './bed-grid-section';
import { DiagonalCheckSection } from './diagonal-check-section';
import { TestCutSection } from './test-cut-section';

/** The machine file's Frame tab: squareness, bed flatness and the test cut. */
export function FramePanel({ machine }: { machine: { id: string; kind: string; workArea: { x: number; y: number } } }) {
  const role = useMe().data?.role;
  // Builders square and level the frame; the test cut is for those who calibrate.
  return (
    <Stack spacing={3}>
      <DiagonalCheckSection machineId={machine.id} canRecord={canRecord(role)} />
      <BedGridSection
        machineId={machine.id}
        machineKind={machine.kind}
        workArea={machine.workArea}
        canRecord={canRecord(role)}
      />
      <TestCutSection machineId={machine.id} machineKind={machine.kind} canRecord={canCalibrate(role)} />
    </Stack>
  );
}
