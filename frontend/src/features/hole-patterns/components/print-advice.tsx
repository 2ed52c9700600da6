import { Alert, MenuItem, Stack, TextField, Typography } from '@mui/material';
import type { Paper } from '../types';

/** How to print a template so it comes out at true scale, and the paper it is tiled over. */
export function PrintAdvice({ paper, onPaper }: { paper: Paper; onPaper: (p: Paper) => void }) {
  return (
    <Alert severity="info" icon={false}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
        <Typography variant="body2" sx={{ flex: 1 }}>
          Print templates at <strong>actual size</strong> (100 %, no “fit to page”), then measure the 100 mm bar on the
          sheet before you centre-punch. Long patterns come on several sheets: trim, overlap on the round marks and
          tape.
        </Typography>
        <TextField
          select
          size="small"
          label="Paper"
          value={paper}
          onChange={(e) => onPaper(e.target.value as Paper)}
          sx={{ minWidth: 120 }}
        >
          <MenuItem value="a4">A4</MenuItem>
          <MenuItem value="letter">Letter</MenuItem>
        </TextField>
      </Stack>
    </Alert>
  );
}
