import type { ReactNode } from 'react';
import { Alert, Box, LinearProgress, Typography } from '@mui/material';

/**
 * What the result area shows around a calculation: a hint until the input is complete, the
 * server's message when it refuses the input, a thin bar while a new result is on its way.
 */
export function CalculationState({
  waitingFor,
  isFetching,
  error,
  children,
}: {
  /** Set while the input is incomplete: what is still needed. */
  waitingFor: string | null;
  isFetching: boolean;
  error: unknown;
  children: ReactNode;
}) {
  return (
    <Box aria-live="polite" aria-busy={isFetching}>
      <Box sx={{ height: 4, mb: 1 }}>{isFetching && <LinearProgress aria-label="Calculating" />}</Box>
      {waitingFor ? (
        <Typography color="text.secondary">{waitingFor}</Typography>
      ) : error ? (
        <Alert severity="warning" role="alert">
          {error instanceof Error ? error.message : String(error)}
        </Alert>
      ) : (
        children
      )}
    </Box>
  );
}
