import { Box, CircularProgress, Typography } from '@mui/material';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <Box
      role="status"
      aria-live="polite"
      sx={{ display: 'flex', alignItems: 'center', gap: 1.5, p: 4, color: 'text.secondary' }}
    >
      <CircularProgress size={22} />
      <Typography>{label}</Typography>
    </Box>
  );
}
