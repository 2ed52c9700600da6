import { Chip } from '@mui/material';
import { palette } from '../../../theme/theme';
import type { DriveStatus } from '../types';

const LOOK: Record<DriveStatus, { label: string; color: string }> = {
  'within-target': { label: 'Within target', color: palette.within },
  'outside-target': { label: 'Outside target', color: palette.outside },
  'not-started': { label: 'Not started', color: palette.notStarted },
  'not-applicable': { label: 'Does not apply', color: palette.notStarted },
};

export function DriveStatusChip({ status, size = 'small' }: { status: DriveStatus; size?: 'small' | 'medium' }) {
  const look = LOOK[status];
  const filled = status === 'within-target' || status === 'outside-target';
  return (
    <Chip
      size={size}
      label={look.label}
      variant={filled ? 'filled' : 'outlined'}
      sx={
        filled
          ? { bgcolor: look.color, color: '#fff', fontWeight: 600 }
          : { color: look.color, borderColor: look.color }
      }
    />
  );
}
