import { Chip } from '@mui/material';
import { palette } from '../../../theme/theme';
import type { CheckState } from '../types';

const LOOK: Record<CheckState, { label: string; color: string }> = {
  'within-target': { label: 'Within target', color: palette.within },
  'outside-target': { label: 'Outside target', color: palette.outside },
  'not-comparable': { label: 'Not comparable', color: palette.notStarted },
  'not-started': { label: 'Not swept yet', color: palette.notStarted },
};

export function CheckStatusChip({ status, size = 'small' }: { status: CheckState; size?: 'small' | 'medium' }) {
  const look = LOOK[status];
  return (
    <Chip
      size={size}
      label={look.label}
      variant={status === 'within-target' || status === 'outside-target' ? 'filled' : 'outlined'}
      sx={
        status === 'within-target' || status === 'outside-target'
          ? { bgcolor: look.color, color: '#fff', fontWeight: 600 }
          : { color: look.color, borderColor: look.color }
      }
    />
  );
}
