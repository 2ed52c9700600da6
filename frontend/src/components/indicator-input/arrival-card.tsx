import { Alert, Box, Button, Typography } from '@mui/material';
import UndoOutlined from '@mui/icons-material/UndoOutlined';
import { UNIT_LABELS } from '../../lib/units';
import type { Arrival } from './use-indicator-input';

/** The reading just arrived, large enough to read from the machine, with where it went. */
export function ArrivalCard({
  last,
  refused,
  onUndo,
}: {
  last: Arrival | null;
  refused: string | null;
  onUndo: () => void;
}) {
  return (
    <>
      {last && (
        <Box
          role="status"
          aria-label="Last reading"
          sx={{
            display: 'flex',
            alignItems: 'center',
            gap: 1.5,
            flexWrap: 'wrap',
            p: 1.5,
            borderRadius: 1,
            bgcolor: '#eef4f2',
            border: '1px solid #bcd3cd',
          }}
        >
          <Box sx={{ flex: '1 1 220px', minWidth: 0 }}>
            <Typography
              component="p"
              sx={{
                fontSize: { xs: '1.6rem', sm: '2rem' },
                fontWeight: 700,
                lineHeight: 1.15,
                fontVariantNumeric: 'tabular-nums',
                overflowWrap: 'anywhere',
              }}
              data-testid="indicator-reading"
            >
              {last.text} {UNIT_LABELS[last.unit]}
              <Box component="span" sx={{ fontWeight: 500, color: 'text.secondary' }}>
                {' → '}
                {last.label ?? 'not filled'}
              </Box>
            </Typography>
            {last.sent && (
              <Typography variant="body2" color="text.secondary">
                Sent as {last.sent}
              </Typography>
            )}
          </Box>
          {last.undo && (
            <Button
              variant="outlined"
              startIcon={<UndoOutlined />}
              onClick={onUndo}
              sx={{ minHeight: 44, minWidth: 96 }}
            >
              Undo
            </Button>
          )}
        </Box>
      )}
      {refused && (
        <Alert severity="warning" role="alert">
          {refused}
        </Alert>
      )}
    </>
  );
}
