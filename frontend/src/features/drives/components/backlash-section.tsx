import { useState } from 'react';
import { Box, Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { EmptyState } from '../../../components/states/empty-state';
import { ErrorState } from '../../../components/states/error-state';
import { LoadingState } from '../../../components/states/loading-state';
import { useCheckRecords } from '../../../lib/check-records/use-check-records';
import { backlashKeys } from '../backlash-types';
import type { Axis } from '../types';
import { showDateTime } from '../utils/format';
import { BacklashEntryGrid } from './backlash-entry-grid';
import { BacklashResult } from './backlash-result';

/** The backlash check of an axis: entry, the newest result (or one picked) and older ones. */
export function BacklashSection({ axis, mayRecord }: { axis: Axis; mayRecord: boolean }) {
  const checks = useCheckRecords('/api/axes/{id}/backlash-checks', axis.id, backlashKeys.list(axis.id));
  const [selected, setSelected] = useState<string | null>(null);
  const list = checks.data ?? [];
  const shown = list.find((c) => c.id === selected) ?? list[0] ?? null;
  return (
    <Stack spacing={2} component="section" aria-labelledby="backlash-title">
      <Typography variant="h3" component="h2" id="backlash-title">
        Backlash check
      </Typography>
      {mayRecord && (
        <Box data-print="hide">
          <BacklashEntryGrid axis={axis} onRecorded={(c) => setSelected(c.id)} />
        </Box>
      )}
      {checks.isPending && <LoadingState label="Loading backlash checks…" />}
      {checks.isError && <ErrorState error={checks.error} onRetry={() => checks.refetch()} />}
      {checks.data && !shown && (
        <EmptyState title="No backlash check yet">
          Read the indicator from both sides at both ends and the middle of the travel and enter the readings.
        </EmptyState>
      )}
      {list.length > 1 && (
        <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, flexWrap: 'wrap' }}>
          <TextField
            select
            label="Showing the check of"
            value={shown?.id ?? ''}
            onChange={(e) => setSelected(e.target.value)}
            sx={{ minWidth: 280, maxWidth: 360 }}
          >
            {list.map((c) => (
              <MenuItem key={c.id} value={c.id}>
                {showDateTime(c.recordedAt)} —{' '}
                {c.unreadable ? 'result unreadable' : c.status === 'within-target' ? 'within target' : 'outside target'}
              </MenuItem>
            ))}
          </TextField>
          {checks.hasNextPage && (
            <Button onClick={() => checks.fetchNextPage()} disabled={checks.isFetchingNextPage}>
              {checks.isFetchingNextPage ? 'Loading older checks…' : 'Load older checks'}
            </Button>
          )}
        </Box>
      )}
      {shown && <BacklashResult check={shown} mayDelete={mayRecord} />}
    </Stack>
  );
}
