import { Alert, Stack } from '@mui/material';
import type { ResultWarning } from '../types';

/** The warnings kept with a record, one per line; nothing when there are none. */
export function WarningList({ warnings }: { warnings: ResultWarning[] }) {
  if (!warnings.length) return null;
  return (
    <Stack spacing={1} sx={{ mb: 2 }} aria-label="Warnings">
      {warnings.map((w) => (
        <Alert key={w.code + w.message} severity="warning" data-warning-code={w.code}>
          {w.message}
        </Alert>
      ))}
    </Stack>
  );
}
