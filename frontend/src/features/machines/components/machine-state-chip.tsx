import { Chip } from '@mui/material';
import type { MachineState } from '../../../lib/machine-state';
import { STATE_LABELS } from '../types';

const COLORS: Record<MachineState, { bg: string; fg: string }> = {
  'being-built': { bg: '#e8eef0', fg: '#2b4650' },
  'awaiting-approval': { bg: '#fdf0d5', fg: '#6b4a00' },
  'ready-to-cut': { bg: '#dcefe3', fg: '#1d5a35' },
  'recheck-due': { bg: '#fbe3df', fg: '#8a1f16' },
  reopened: { bg: '#ece4f5', fg: '#4d2f78' },
  retired: { bg: '#ecebe8', fg: '#5b5b57' },
};

export function MachineStateChip({ state }: { state: MachineState }) {
  const c = COLORS[state];
  return <Chip size="small" label={STATE_LABELS[state]} sx={{ bgcolor: c.bg, color: c.fg, fontWeight: 600 }} />;
}
