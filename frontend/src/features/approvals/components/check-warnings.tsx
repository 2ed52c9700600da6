import { Alert, Box } from '@mui/material';
import type { CheckWarning } from '../types';

/** A check's warnings under its result: they do not change the state, but a reviewer should read them. */
export function CheckWarnings({ warnings }: { warnings: CheckWarning[] | undefined }) {
  if (!warnings?.length) return null;
  return (
    <Box
      component="ul"
      aria-label="Warnings"
      sx={{ listStyle: 'none', p: 0, m: 0, mt: 0.5, display: 'grid', gap: 0.5, maxWidth: 380 }}
    >
      {warnings.map((w, i) => (
        <Box component="li" key={`${w.code}-${i}`}>
          <Alert
            severity="warning"
            variant="outlined"
            data-warning-code={w.code}
            sx={{ py: 0, px: 1, fontSize: 12, '& .MuiAlert-icon': { fontSize: 16, py: 0.75, mr: 0.75 } }}
          >
            {w.message}
          </Alert>
        </Box>
      ))}
    </Box>
  );
}
