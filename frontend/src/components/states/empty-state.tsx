import type { ReactNode } from 'react';
import { Box, Typography } from '@mui/material';

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <Box
      sx={{
        p: 4,
        textAlign: 'center',
        border: '1px dashed',
        borderColor: 'divider',
        borderRadius: 1,
        bgcolor: 'background.paper',
      }}
    >
      <Typography variant="h4" component="p" gutterBottom>
        {title}
      </Typography>
      {children && (
        <Typography color="text.secondary" sx={{ mb: action ? 2 : 0 }}>
          {children}
        </Typography>
      )}
      {action}
    </Box>
  );
}
