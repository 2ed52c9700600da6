import { Alert, Box, Paper, Stack, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { UNIT_LABELS } from '../../../lib/units';
import { useDeleteCheck } from '../../../lib/check-records/use-delete-check';
import type { BacklashCheck } from '../backlash-types';
import { driveKeys } from '../types';
import { showDateTime, showTarget } from '../utils/format';
import { DeleteRecordButton } from './delete-record-button';
import { DriveStatusChip } from './drive-status-chip';
import { ResponsiveTable } from '../../../components/table/responsive-table';

const DIGITS = { mm: 4, um: 1, in: 5, thou: 2 } as const;

/** One backlash check: the largest value against the target, each position, warnings and the definition. */
export function BacklashResult({ check, mayDelete }: { check: BacklashCheck; mayDelete: boolean }) {
  const remove = useDeleteCheck('/api/axes/{id}/backlash-checks/{checkId}', check.axisId, [driveKeys.all]);
  const ru = UNIT_LABELS[check.readingUnit];
  const lu = UNIT_LABELS[check.lengthUnit];
  const r = check.result;
  const show = (v: number) => `${v.toFixed(DIGITS[check.readingUnit])} ${ru}`;
  return (
    <Paper component="section" variant="outlined" sx={{ p: 2 }} aria-label="Backlash result">
      <Stack spacing={1.5}>
        <Box sx={{ display: 'flex', gap: 1.5, alignItems: 'center', flexWrap: 'wrap' }}>
          <DriveStatusChip status={check.status} />
          {r ? (
            <Typography variant="h4" component="p">
              Backlash {show(r.backlash)}{' '}
              <Typography component="span" color="text.secondary">
                ({r.backlashMm.toFixed(4)} mm) largest, at {+r.worstPosition.toFixed(4)} {lu}
              </Typography>
            </Typography>
          ) : (
            <Alert severity="error">{check.unreadable}</Alert>
          )}
        </Box>
        <Typography variant="body2">
          Target: reversal value (backlash) ≤ {showTarget(check.target)}
          {check.target.source ? ` — ${check.target.source}` : ''}
        </Typography>
        {check.warnings.map((w) => (
          <Alert key={w.code} severity="warning">
            {w.message}
          </Alert>
        ))}
        {r && (
          <ResponsiveTable titleFirst={false}>
            <Table size="small" aria-label="Backlash at each position">
              <TableHead>
                <TableRow>
                  <TableCell>Position ({lu})</TableCell>
                  <TableCell align="right">Mean up ({ru})</TableCell>
                  <TableCell align="right">Mean down ({ru})</TableCell>
                  <TableCell align="right">Backlash ({ru})</TableCell>
                  <TableCell align="right">Approaches</TableCell>
                </TableRow>
              </TableHead>
              <TableBody>
                {r.positions.map((p) => (
                  <TableRow key={p.positionMm}>
                    <TableCell>{+p.position.toFixed(4)}</TableCell>
                    <TableCell align="right">{p.meanUp.toFixed(DIGITS[check.readingUnit])}</TableCell>
                    <TableCell align="right">{p.meanDown.toFixed(DIGITS[check.readingUnit])}</TableCell>
                    <TableCell align="right" sx={{ fontWeight: p.positionMm === r.worstPositionMm ? 700 : undefined }}>
                      {p.backlash.toFixed(DIGITS[check.readingUnit])}
                    </TableCell>
                    <TableCell align="right">
                      {p.approachesUp} up, {p.approachesDown} down
                    </TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          </ResponsiveTable>
        )}
        <Typography variant="body2" color="text.secondary">
          {check.definition}
        </Typography>
        <Typography variant="body2" color="text.secondary">
          Recorded by {check.recordedBy}, {showDateTime(check.recordedAt)}
          {check.resolution !== null ? ` · indicator resolution ${check.resolution} ${ru}` : ''}
          {check.notes ? ` · ${check.notes}` : ''}
        </Typography>
        {mayDelete && (
          <DeleteRecordButton
            what="backlash check"
            locked={check.locked}
            onDelete={() => remove.mutate(check.id)}
            pending={remove.isPending}
            error={remove.error}
          />
        )}
      </Stack>
    </Paper>
  );
}
