import type { ReactNode } from 'react';
import { Box, Paper, Typography } from '@mui/material';

/** Inputs on the left, results on the right (stacked on narrow screens); an optional chart below. */
export function CalculatorLayout({
  intro,
  inputs,
  results,
  chart,
}: {
  intro: ReactNode;
  inputs: ReactNode;
  results: ReactNode;
  chart?: ReactNode;
}) {
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Typography color="text.secondary">{intro}</Typography>
      <Box
        sx={{
          display: 'grid',
          gap: 2,
          gridTemplateColumns: { xs: '1fr', md: 'minmax(300px, 5fr) 6fr' },
          alignItems: 'start',
        }}
      >
        <Paper component="section" aria-label="Inputs" sx={{ p: 2, display: 'grid', gap: 2 }}>
          {inputs}
        </Paper>
        <Paper component="section" aria-label="Result" sx={{ p: 2 }}>
          <Typography variant="h4" component="h2" sx={{ mb: 1 }}>
            Result
          </Typography>
          {results}
        </Paper>
      </Box>
      {chart && (
        <Paper component="section" aria-label="Chart" sx={{ p: 2 }}>
          {chart}
        </Paper>
      )}
    </Box>
  );
}
