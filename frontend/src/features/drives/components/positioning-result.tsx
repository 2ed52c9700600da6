import { Box, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { PositioningChart } from '../../../components/charts/positioning-chart';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import type { PositioningRun, Verdict } from '../types';
import { showDateTime, showLength, showTarget } from '../utils/format';
import { DriveStatusChip } from './drive-status-chip';
import { DeleteRecordButton } from './delete-record-button';
import { UnreadableRecord } from '../../../components/unreadable-record';
import { useDeletePositioningRun } from '../api/delete-positioning-run';
import { WarningList } from './warning-list';
import { ThermalNote } from './thermal-note';

function Judged({ label, verdict, unit }: { label: string; verdict: Verdict; unit: PositioningRun['readingUnit'] }) {
  return (
    <Box>
      <Typography variant="body2" color="text.secondary">
        {label}
      </Typography>
      <Typography sx={{ fontWeight: 600, color: verdict.pass ? 'success.main' : 'error.main' }}>
        {showLength(verdict.value, unit)}
      </Typography>
      <Typography variant="body2" color="text.secondary">
        target ≤ {showTarget(verdict.target)} · {verdict.pass ? 'passes' : 'fails'}
      </Typography>
    </Box>
  );
}

/** ISO 230-2 results of one run, judged against the target set, with the mean deviations chart. */
export function PositioningResult({ run, mayDelete }: { run: PositioningRun; mayDelete: boolean }) {
  const remove = useDeletePositioningRun(run.axisId);
  const r = run.result;
  const checks = run.checks;
  const u = run.readingUnit;
  const lu = run.lengthUnit;
  const ul = UNIT_LABELS[u];
  if (!r || !checks) {
    return (
      <Paper sx={{ p: 2.5 }} component="section" aria-label="Repeat-and-reverse result">
        <Typography variant="h4" component="h3" gutterBottom>
          Repeat-and-reverse run of {showDateTime(run.recordedAt)}
        </Typography>
        <UnreadableRecord message={run.unreadable ?? 'This run cannot be read.'} />
        {mayDelete && (
          <Box sx={{ mt: 1 }}>
            <DeleteRecordButton
              what="run"
              locked={run.locked}
              onDelete={() => remove.mutate(run.id)}
              pending={remove.isPending}
              error={remove.error}
            />
          </Box>
        )}
      </Paper>
    );
  }
  return (
    <Paper sx={{ p: 2.5 }} component="section" aria-label="Repeat-and-reverse result">
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, flexWrap: 'wrap', mb: 1.5 }}>
        <Typography variant="h4" component="h3" sx={{ flex: '1 1 auto' }}>
          Repeat-and-reverse run of {showDateTime(run.recordedAt)}
        </Typography>
        <DriveStatusChip status={run.status} />
      </Box>
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr 1fr', md: 'repeat(4, 1fr)' }, gap: 2, mb: 2 }}>
        <Judged label="Positioning accuracy A" verdict={checks.accuracy} unit={u} />
        <Judged label="Repeatability R (bidirectional)" verdict={checks.repeatability} unit={u} />
        <Judged label="Reversal value B" verdict={checks.reversal} unit={u} />
        <Box>
          <Typography variant="body2" color="text.secondary">
            Systematic deviation E
          </Typography>
          <Typography sx={{ fontWeight: 600 }}>{showLength(r.systematic, u)}</Typography>
          <Typography variant="body2" color="text.secondary">
            mean reversal {showLength(r.reversalMean, u)} · M {showLength(r.meanRange, u)}
          </Typography>
        </Box>
      </Box>
      <WarningList warnings={run.warnings} />
      <PositioningChart
        label={`Mean deviations up and down with ±2s bands, ${ul}`}
        unitLabel={ul}
        target={{
          width: fromMm(checks.accuracy.targetMm, u),
          label: `Accuracy target ${showTarget(checks.accuracy.target)} wide`,
        }}
        targets={r.targets.map((t) => ({
          target: t.target,
          meanUp: fromMm(t.meanUp, u),
          meanDown: fromMm(t.meanDown, u),
          sUp: fromMm(t.sUp, u),
          sDown: fromMm(t.sDown, u),
        }))}
      />
      <Box sx={{ overflowX: 'auto', mt: 1 }}>
        <Table size="small" aria-label="Results per target">
          <TableHead>
            <TableRow>
              <TableCell>Target</TableCell>
              <TableCell align="right">Mean up</TableCell>
              <TableCell align="right">Mean down</TableCell>
              <TableCell align="right">Reversal Bᵢ</TableCell>
              <TableCell align="right">s up</TableCell>
              <TableCell align="right">s down</TableCell>
              <TableCell align="right">Rᵢ</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {r.targets.map((t) => (
              <TableRow key={t.target}>
                <TableCell>{showLength(t.target, lu, lu === 'in' ? 3 : 1)}</TableCell>
                <TableCell align="right">{showLength(t.meanUp, u)}</TableCell>
                <TableCell align="right">{showLength(t.meanDown, u)}</TableCell>
                <TableCell align="right">{showLength(t.reversal, u)}</TableCell>
                <TableCell align="right">{showLength(t.sUp, u)}</TableCell>
                <TableCell align="right">{showLength(t.sDown, u)}</TableCell>
                <TableCell align="right">{showLength(t.repeatability, u)}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </Box>
      <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
        {r.runsUp} runs up, {r.runsDown} down · recorded by {run.recordedBy}
        {run.notes ? ` · ${run.notes}` : ''}. Accuracy, repeatability and reversal follow ISO 230-2 (±2s bands, 4s
        repeatability).
      </Typography>
      <ThermalNote record={run} />
      {mayDelete && (
        <Box sx={{ mt: 1 }}>
          <DeleteRecordButton
            what="run"
            locked={run.locked}
            onDelete={() => remove.mutate(run.id)}
            pending={remove.isPending}
            error={remove.error}
          />
        </Box>
      )}
    </Paper>
  );
}
