import { Chip } from '@mui/material';
import { palette } from '../../../theme/theme';
import type { FrameStatus } from '../types';

const LOOK: Record<FrameStatus, { label: string; color: string }> = {
  'within-target': { label: 'Within target', color: palette.within },
  'outside-target': { label: 'Outside target', color: palette.outside },
};

export function StatusChip({ status }: { status: FrameStatus }) {
  const look = LOOK[status];
  return <Chip size="small" label={look.label} sx={{ bgcolor: look.color, color: '#fff', fontWeight: 600 }} />;
}
