import { useState } from 'react';
import { Box, Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { EmptyState } from '../../../components/states/empty-state';
import { ErrorState } from '../../../components/states/error-state';
import { LoadingState } from '../../../components/states/loading-state';
import { usePositioningRun } from '../api/get-positioning-run';
import { usePositioningRuns } from '../api/get-positioning-runs';
import type { Axis } from '../types';
import { showDateTime } from '../utils/format';
import { PositioningGrid } from './positioning-grid';
import { PositioningResult } from './positioning-result';

const verdictWords = (status: 'within-target' | 'outside-target', unreadable?: string) =>
  unreadable ? 'result unreadable' : status === 'within-target' ? 'within target' : 'outside target';

/** The list holds summaries; the run shown (the newest unless one is picked) is fetched in full for its chart. */
export function PositioningSection({ axis, mayRecord }: { axis: Axis; mayRecord: boolean }) {
  const runs = usePositioningRuns(axis.id);
  const [selected, setSelected] = useState<string | null>(null);
  const list = runs.data ?? [];
  const shownId = list.find((r) => r.id === selected)?.id ?? list[0]?.id ?? null;
  const shown = usePositioningRun(axis.id, shownId);
  return (
    <Stack spacing={2} component="section" aria-labelledby="runs-title">
      <Typography variant="h3" component="h2" id="runs-title">
        Repeat-and-reverse run
      </Typography>
      {mayRecord && (
        <Box data-print="hide">
          <PositioningGrid axis={axis} onRecorded={(r) => setSelected(r.id)} />
        </Box>
      )}
      {runs.isPending && <LoadingState label="Loading runs…" />}
      {runs.isError && <ErrorState error={runs.error} onRetry={() => runs.refetch()} />}
      {runs.data && !shownId && (
        <EmptyState title="No repeat-and-reverse run yet">
          Download the test program, run it with an indicator on the axis and enter the readings.
        </EmptyState>
      )}
      {list.length > 1 && (
        <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, flexWrap: 'wrap' }}>
          <TextField
            select
            label="Showing the run of"
            value={shownId ?? ''}
            onChange={(e) => setSelected(e.target.value)}
            sx={{ minWidth: 280, maxWidth: 360 }}
          >
            {list.map((r) => (
              <MenuItem key={r.id} value={r.id}>
                {showDateTime(r.recordedAt)} — {verdictWords(r.status, r.unreadable)}
              </MenuItem>
            ))}
          </TextField>
          {runs.hasNextPage && (
            <Button onClick={() => runs.fetchNextPage()} disabled={runs.isFetchingNextPage}>
              {runs.isFetchingNextPage ? 'Loading older runs…' : 'Load older runs'}
            </Button>
          )}
        </Box>
      )}
      {shownId && shown.isPending && <LoadingState label="Loading the run…" />}
      {shownId && shown.isError && <ErrorState error={shown.error} onRetry={() => shown.refetch()} />}
      {shown.data && <PositioningResult run={shown.data} mayDelete={mayRecord} />}
    </Stack>
  );
}
