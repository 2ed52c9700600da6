import { Alert, Stack } from '@mui/material';
import type { ResultWarning } from '../types';

/** The warnings a result carries, one alert each; nothing when there are none. */
export function ResultWarnings({ warnings, label }: { warnings: ResultWarning[] | undefined; label: string }) {
  if (!warnings?.length) return null;
  return (
    <Stack spacing={1} component="ul" aria-label={label} sx={{ listStyle: 'none', p: 0, m: 0 }}>
      {warnings.map((w) => (
        <Alert key={`${w.code}:${w.message}`} component="li" severity="warning" data-warning-code={w.code}>
          {w.message}
        </Alert>
      ))}
    </Stack>
  );
}
