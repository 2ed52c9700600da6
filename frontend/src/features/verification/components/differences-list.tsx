import { Box, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { RECORD_KIND_LABELS, type RecordDifference } from '../types';

const show = (value: unknown) => (value === null ? '—' : typeof value === 'string' ? value : JSON.stringify(value));

/** Path inside the record, without the record's own key (the "Record" column names it). */
const fieldOf = (d: RecordDifference) => d.path.replace(/^records\["[^"]+"\]\.?/, '') || '(the whole record)';

const whereOf = (d: RecordDifference) =>
  d.record ? `${RECORD_KIND_LABELS[d.record.kind] ?? d.record.kind} ${d.record.id.slice(0, 8)}` : d.path.startsWith('approval.') ? 'Approval' : d.path.startsWith('targetValues') ? 'Target values' : 'Results as signed';

/** Each value that is not what was signed: where it is, what was signed, what is there now. */
export function DifferencesList({ differences, more }: { differences: RecordDifference[]; more: number }) {
  return (
    <Paper sx={{ p: { xs: 2, sm: 3 } }}>
      <Typography variant="h4" component="h2">
        What differs from the signed record
      </Typography>
      <Box sx={{ overflowX: 'auto', mt: 1 }}>
        <Table size="small" aria-label="Differences from the signed record">
          <TableHead>
            <TableRow>
              <TableCell>Where</TableCell>
              <TableCell>Field</TableCell>
              <TableCell>Signed</TableCell>
              <TableCell>Now</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {differences.map((d) => (
              <TableRow key={d.path}>
                <TableCell sx={{ whiteSpace: 'nowrap' }}>{whereOf(d)}</TableCell>
                <TableCell sx={{ fontFamily: 'monospace', overflowWrap: 'anywhere' }}>{fieldOf(d)}</TableCell>
                <TableCell sx={{ overflowWrap: 'anywhere', maxWidth: 280 }}>{d.change === 'added' ? '(absent)' : show(d.signed)}</TableCell>
                <TableCell sx={{ overflowWrap: 'anywhere', maxWidth: 280, color: 'error.main', fontWeight: 600 }}>{d.change === 'removed' ? '(absent)' : show(d.current)}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </Box>
      {more > 0 && (
        <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
          …and {more} more difference{more === 1 ? '' : 's'}.
        </Typography>
      )}
    </Paper>
  );
}
