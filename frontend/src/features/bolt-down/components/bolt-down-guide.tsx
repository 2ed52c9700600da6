import { useState } from 'react';
import { positionText } from '../utils/position-text';
import { Alert, AlertTitle, Box, LinearProgress, Paper, Typography } from '@mui/material';
import { BoltDownChart } from '../../../components/charts/bolt-down-chart';
import { UNIT_LABELS } from '../../../lib/units';
import { useWaitingEntries } from '../../../lib/offline/use-waiting-entries';
import { useRecordHole } from '../api/record-hole';
import { finalSweepPath } from '../api/save-final-sweep';
import { MODE_EXPLAINED, MODE_LABELS, type BoltDown } from '../types';
import { guideState } from '../utils/guide-state';
import { plain, signed } from '../utils/format';
import { FinalSweepForm } from './final-sweep-form';
import { FinalSweepResult } from './final-sweep-result';
import { HoleEntryPanel, type Refusal } from './hole-entry-panel';
import { HolesTable } from './holes-table';
import { formatDateTime } from '../../../lib/format-time';

interface Props {
  bd: BoltDown;
  canRecord: boolean;
  typicalBoltSize: string | null;
}

/** The hole-by-hole guide: the hole to fix, its aim and difference, progress, and the holes in order. */
export function BoltDownGuide({ bd, canRecord, typicalBoltSize }: Props) {
  const pending = useWaitingEntries(`/bolt-downs/${bd.id}/`);
  const state = guideState(bd, pending);
  const [picked, setPicked] = useState<number | null>(null);
  const [refusal, setRefusal] = useState<Refusal | null>(null);
  // Refused by the server: back to that hole with what was typed, so it can be corrected.
  const record = useRecordHole(bd, (input, message) => {
    setRefusal({ index: input.index, text: String(input.reading), message });
    setPicked(input.index);
  });
  const open = !bd.finalSweepId && !bd.abandoned;
  const selected = picked ?? state.nextHole;
  const hole = selected === null ? null : state.holes[selected];
  const unit = UNIT_LABELS[bd.readingUnit];
  const sweepWaiting = pending.some((w) => w.path === finalSweepPath(bd.id));
  const fixed = state.holes
    .filter((h) => h.fixed && h.reading !== null)
    .map((h) => ({ position: h.position, reading: h.reading! }));

  return (
    <Box>
      {bd.abandoned && (
        <Alert severity="warning" sx={{ mb: 2 }} data-testid="abandoned">
          <AlertTitle>Abandoned</AlertTitle>
          {bd.abandoned.by ?? 'Someone'} abandoned this bolt-down on {formatDateTime(bd.abandoned.at)} with{' '}
          {state.fixedCount} of {bd.holeCount} holes fixed: “{bd.abandoned.reason}”. Its readings stay in the
          machine&apos;s history; begin a new bolt-down to align the rail.
        </Alert>
      )}
      <Alert severity="info" icon={false} sx={{ mb: 2 }} role="note" data-testid="mode-explained">
        <strong>{MODE_LABELS[bd.mode]}.</strong> {MODE_EXPLAINED[bd.mode]} Holes are fixed one end first, then the far
        end, then the middles of the gaps. Readings in {unit}; on target within ±{plain(bd.band, bd.readingUnit)} of the
        aim.
      </Alert>

      <Paper sx={{ p: 2, mb: 2 }}>
        <Typography variant="h3" component="p" data-testid="progress">
          {state.fixedCount} of {bd.holeCount} holes fixed
        </Typography>
        <LinearProgress
          variant="determinate"
          value={(100 * state.fixedCount) / Math.max(bd.holeCount, 1)}
          sx={{ mt: 1, height: 8, borderRadius: 4 }}
          aria-label="Holes fixed"
        />
      </Paper>

      <Box
        sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', lg: 'minmax(0, 3fr) minmax(0, 2fr)' }, gap: 2, mb: 2 }}
      >
        <Box>
          {canRecord && hole && open && (
            <HoleEntryPanel
              // Keyed by the hole, so nothing typed at one hole leaks to the next.
              key={hole.index}
              bd={bd}
              hole={hole}
              isNext={hole.index === state.nextHole}
              refusal={refusal?.index === hole.index ? refusal : null}
              record={record}
              onFixed={() => {
                setPicked(null);
                setRefusal(null);
              }}
            />
          )}
          {!canRecord && open && !state.complete && hole && (
            <Paper sx={{ p: { xs: 2, md: 3 } }} aria-label="Next hole">
              <Typography color="text.secondary">Next to fix</Typography>
              <Typography variant="h2" component="h2" sx={{ mb: 0.5 }}>
                Hole {hole.index + 1} · {positionText(hole.position, bd.lengthUnit)}
              </Typography>
              <Typography sx={{ fontSize: '1.6rem', fontWeight: 500 }}>
                Aim {hole.target === null ? 'any reading (sets the datum)' : signed(hole.target, bd.readingUnit)}
              </Typography>
              <Alert severity="info" sx={{ mt: 2 }}>
                You can follow the guide; people who record checks fix the holes.
              </Alert>
            </Paper>
          )}
          {state.complete && open && canRecord && picked === null && !sweepWaiting && (
            <FinalSweepForm bd={bd} holes={state.holes} typicalBoltSize={typicalBoltSize} />
          )}
          {sweepWaiting && !bd.finalSweepId && (
            <Alert severity="info" sx={{ mb: 2 }} data-testid="final-sweep-waiting">
              <AlertTitle>Final sweep waiting to send</AlertTitle>
              It is kept on this device and recorded once, after the hole readings before it, when the connection
              returns.
            </Alert>
          )}
          {bd.finalSweepId && <FinalSweepResult sweepId={bd.finalSweepId} />}
        </Box>
        <Paper sx={{ p: 2 }}>
          <Typography variant="h4" component="h2" gutterBottom>
            Fixed readings along the rail
          </Typography>
          <BoltDownChart
            fixed={fixed}
            holePositions={bd.holes.map((h) => h.position)}
            aim={
              open && hole && !hole.fixed && hole.target !== null
                ? { position: hole.position, reading: hole.target }
                : null
            }
            lengthMm={bd.rail.lengthMm}
            unitLabel={unit}
          />
        </Paper>
      </Box>

      <Typography variant="h4" component="h2" sx={{ mb: 1 }}>
        Holes in fixing order{canRecord && open ? ' (pick one to fix or re-fix it)' : ''}
      </Typography>
      <HolesTable
        bd={bd}
        holes={state.inOrder}
        nextHole={open ? state.nextHole : null}
        selected={open ? selected : null}
        onSelect={canRecord && open ? setPicked : undefined}
      />
    </Box>
  );
}
