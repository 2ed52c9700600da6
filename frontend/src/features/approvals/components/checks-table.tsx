import { Link as RouterLink } from 'react-router-dom';
import { Box, Button, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { ResponsiveTable } from '../../../components/table/responsive-table';
import { dateOnly, dateTime, resultText, targetText } from '../format';
import { KIND_LABELS, type BoardCheck } from '../types';
import { CheckStatusChip } from './check-status-chip';
import { CheckWarnings } from './check-warnings';
import { checkPath } from '../check-place';

interface Props {
  checks: BoardCheck[];
  /** Offered on checks that block, when the viewer may waive. */
  onWaive?: (check: BoardCheck) => void;
}

/** Every required check with its latest result, target, state and evidence. */
export function ChecksTable({ checks, onWaive }: Props) {
  return (
    <ResponsiveTable component={Paper}>
      <Table size="small" aria-label="Required checks">
        <TableHead>
          <TableRow>
            <TableCell>Check</TableCell>
            <TableCell>Latest result</TableCell>
            <TableCell>Target</TableCell>
            <TableCell>State</TableCell>
            <TableCell align="right">Evidence</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {checks.map((c) => (
            <TableRow key={c.key} data-check={c.key}>
              <TableCell sx={{ minWidth: 170 }}>
                <Typography variant="body2" sx={{ fontWeight: 600 }}>
                  {KIND_LABELS[c.kind]}
                </Typography>
                <Typography variant="body2" color="text.secondary">
                  {c.subject}
                </Typography>
              </TableCell>
              <TableCell sx={{ minWidth: 150 }}>
                <Typography variant="body2" sx={{ fontWeight: 600, fontVariantNumeric: 'tabular-nums' }}>
                  {resultText(c.result)}
                </Typography>
                {c.result?.summary && (
                  <Typography variant="caption" color="text.secondary" component="div">
                    {c.result.summary}
                  </Typography>
                )}
                {c.recordedAt && (
                  <Typography variant="caption" color="text.secondary" component="div">
                    recorded {dateOnly(c.recordedAt)}
                  </Typography>
                )}
                <CheckWarnings warnings={c.warnings} />
              </TableCell>
              <TableCell sx={{ whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' }}>
                {targetText(c.kind, c.target)}
              </TableCell>
              <TableCell sx={{ minWidth: 150 }}>
                <CheckStatusChip status={c.status} />
                {c.waiver && (
                  <Typography variant="caption" component="div" sx={{ mt: 0.5, maxWidth: 280 }}>
                    “{c.waiver.reason}” — {c.waiver.by}, {dateTime(c.waiver.at)}
                  </Typography>
                )}
                {/* The safety walk is answered, never waived. */}
                {onWaive &&
                  c.kind !== 'safety-walk' &&
                  (c.status === 'outside-target' || c.status === 'not-started') && (
                    <Box sx={{ mt: 0.5 }}>
                      <Button
                        size="small"
                        onClick={() => onWaive(c)}
                        aria-label={`Waive ${KIND_LABELS[c.kind]} of ${c.subject}`}
                      >
                        Waive…
                      </Button>
                    </Box>
                  )}
              </TableCell>
              <TableCell align="right">
                <Button component={RouterLink} to={checkPath(c.place)} size="small">
                  {c.recordId ? 'Open' : 'Record'}
                </Button>
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </ResponsiveTable>
  );
}
