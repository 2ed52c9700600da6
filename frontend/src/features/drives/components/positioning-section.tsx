import { useState } from 'react';
import { MenuItem, Stack, TextField, Typography } from '@mui/material';
import { EmptyState } from '../../../components/states/empty-state';
import { ErrorState } from '../../../components/states/error-state';
import { LoadingState } from '../../../components/states/loading-state';
import { usePositioningRuns } from '../api/get-positioning-runs';
import type { Axis } from '../types';
import { showDateTime } from '../utils/format';
import { PositioningGrid } from './positioning-grid';
import { PositioningResult } from './positioning-result';

export function PositioningSection({ axis, mayRecord }: { axis: Axis; mayRecord: boolean }) {
  const runs = usePositioningRuns(axis.id);
  const [selected, setSelected] = useState<string | null>(null);
  const list = runs.data ?? [];
  const shown = list.find((r) => r.id === selected) ?? list[0];
  return (
    <Stack spacing={2} component="section" aria-labelledby="runs-title">
      <Typography variant="h3" component="h2" id="runs-title">
        Repeat-and-reverse run
      </Typography>
      {mayRecord && <PositioningGrid axis={axis} onRecorded={(r) => setSelected(r.id)} />}
      {runs.isPending && <LoadingState label="Loading runs…" />}
      {runs.isError && <ErrorState error={runs.error} onRetry={() => runs.refetch()} />}
      {runs.data && !shown && <EmptyState title="No repeat-and-reverse run yet">Download the test program, run it with an indicator on the axis and enter the readings.</EmptyState>}
      {list.length > 1 && (
        <TextField select label="Showing the run of" value={shown?.id ?? ''} onChange={(e) => setSelected(e.target.value)} sx={{ maxWidth: 360 }}>
          {list.map((r) => (
            <MenuItem key={r.id} value={r.id}>
              {showDateTime(r.recordedAt)} — {r.status === 'within-target' ? 'within target' : 'outside target'}
            </MenuItem>
          ))}
        </TextField>
      )}
      {shown && <PositioningResult run={shown} mayDelete={mayRecord} />}
    </Stack>
  );
}
