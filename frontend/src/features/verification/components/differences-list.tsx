import { Box, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { RECORD_KIND_LABELS, type RecordDifference } from '../types';

const show = (value: unknown) =>
  value === null ? '—' : value === '' ? '(empty)' : typeof value === 'string' ? value : JSON.stringify(value);

/** Path inside the record, without the record's own key (the "Record" column names it). */
const fieldOf = (d: RecordDifference) =>
  d.path.replace(/^records\["[^"]+"\]\.?/, '').replace(/^row\./, '') || '(the whole record)';

const whereOf = (d: RecordDifference) =>
  d.record
    ? `${RECORD_KIND_LABELS[d.record.kind] ?? d.record.kind} ${d.record.id.slice(0, 8)}`
    : d.path.startsWith('approval.')
      ? 'Approval'
      : d.path.startsWith('targetValues')
        ? 'Target values'
        : 'Results as signed';

/** Each value that is not what was signed: where it is, what was signed, what is there now. */
export function DifferencesList({ differences, more }: { differences: RecordDifference[]; more: number }) {
  return (
    <Paper sx={{ p: { xs: 2, sm: 3 } }}>
      <Typography variant="h4" component="h2">
        What differs from the signed record
      </Typography>
      {/* Narrow screens: one block per difference, so values are never cut off. */}
      <Box
        component="ul"
        sx={{ display: { xs: 'block', sm: 'none' }, listStyle: 'none', p: 0, m: 0, mt: 1 }}
        aria-label="Differences from the signed record"
      >
        {differences.map((d) => (
          <Box component="li" key={d.path} sx={{ py: 1.5, borderTop: '1px solid', borderColor: 'divider' }}>
            <Typography variant="subtitle2">{whereOf(d)}</Typography>
            <Typography
              variant="body2"
              sx={{ fontFamily: 'monospace', overflowWrap: 'anywhere', color: 'text.secondary' }}
            >
              {fieldOf(d)}
            </Typography>
            <Box sx={{ display: 'grid', gridTemplateColumns: 'auto 1fr', columnGap: 1.5, mt: 0.5 }}>
              <Typography variant="body2" color="text.secondary">
                Signed
              </Typography>
              <Typography variant="body2" sx={{ overflowWrap: 'anywhere' }}>
                {d.change === 'added' ? '(absent)' : show(d.signed)}
              </Typography>
              <Typography variant="body2" color="text.secondary">
                Now
              </Typography>
              <Typography variant="body2" sx={{ overflowWrap: 'anywhere', color: 'error.main', fontWeight: 600 }}>
                {d.change === 'removed' ? '(absent)' : show(d.current)}
              </Typography>
            </Box>
          </Box>
        ))}
      </Box>
      <Box sx={{ overflowX: 'auto', mt: 1, display: { xs: 'none', sm: 'block' } }}>
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
                <TableCell sx={{ overflowWrap: 'anywhere', maxWidth: 280 }}>
                  {d.change === 'added' ? '(absent)' : show(d.signed)}
                </TableCell>
                <TableCell sx={{ overflowWrap: 'anywhere', maxWidth: 280, color: 'error.main', fontWeight: 600 }}>
                  {d.change === 'removed' ? '(absent)' : show(d.current)}
                </TableCell>
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
