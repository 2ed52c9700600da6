import { Alert, Box } from '@mui/material';
import type { ResultWarning } from '../types';

/** What a person should know about a result: each warning the server gave, in its own words. */
export function ResultWarnings({ warnings }: { warnings: ResultWarning[] | undefined }) {
  if (!warnings?.length) return null;
  return (
    <Box component="section" aria-label="Warnings" sx={{ display: 'grid', gap: 1, mt: 2 }}>
      {warnings.map((w, i) => (
        <Alert key={`${w.code}-${i}`} severity="warning" data-warning-code={w.code}>
          {w.message}
        </Alert>
      ))}
    </Box>
  );
}
