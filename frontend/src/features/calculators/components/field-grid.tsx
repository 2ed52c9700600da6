import type { ReactNode } from 'react';
import { Box } from '@mui/material';

/** Number fields in as many columns as fit, each at least wide enough for its label and unit. */
export function FieldGrid({ children }: { children: ReactNode }) {
  return (
    <Box
      sx={{
        display: 'grid',
        gap: 2,
        gridTemplateColumns: 'repeat(auto-fill, minmax(190px, 1fr))',
        alignItems: 'start',
      }}
    >
      {children}
    </Box>
  );
}
