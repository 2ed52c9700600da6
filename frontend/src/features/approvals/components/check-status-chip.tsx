import { Chip } from '@mui/material';
import { alpha } from '@mui/material/styles';
import { palette } from '../../../theme/theme';
import { STATUS_LABELS, type CheckStatus } from '../types';

export const STATUS_COLOURS: Record<CheckStatus, string> = {
  'within-target': palette.within,
  'outside-target': palette.outside,
  waived: palette.waived,
  'not-started': palette.notStarted,
};

export function CheckStatusChip({ status }: { status: CheckStatus }) {
  const colour = STATUS_COLOURS[status];
  return (
    <Chip
      size="small"
      label={STATUS_LABELS[status]}
      sx={{ bgcolor: alpha(colour, 0.12), color: colour, fontWeight: 600, border: `1px solid ${alpha(colour, 0.4)}` }}
    />
  );
}
