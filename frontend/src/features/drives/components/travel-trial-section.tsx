import { useState } from 'react';
import { Box, Stack, Typography } from '@mui/material';
import { EmptyState } from '../../../components/states/empty-state';
import { ErrorState } from '../../../components/states/error-state';
import { LoadingState } from '../../../components/states/loading-state';
import { useTravelTrial } from '../api/get-travel-trial';
import { useTravelTrials } from '../api/get-travel-trials';
import type { Axis } from '../types';
import { TravelTrialEntry } from './travel-trial-entry';
import { TravelTrialHistory } from './travel-trial-history';
import { TravelTrialResult } from './travel-trial-result';

/** The list holds summaries; the trial shown above it (the newest unless one is picked) is fetched in full. */
export function TravelTrialSection({ axis, mayRecord }: { axis: Axis; mayRecord: boolean }) {
  const trials = useTravelTrials(axis.id);
  const [selected, setSelected] = useState<string | null>(null);
  const list = trials.data ?? [];
  const shownId = list.find((t) => t.id === selected)?.id ?? list[0]?.id ?? null;
  const shown = useTravelTrial(axis.id, shownId);
  return (
    <Stack spacing={2} component="section" aria-labelledby="trial-title">
      <Typography variant="h3" component="h2" id="trial-title">
        Travel trial
      </Typography>
      {mayRecord && (
        <Box data-print="hide">
          <TravelTrialEntry axis={axis} onRecorded={(t) => setSelected(t.id)} />
        </Box>
      )}
      {trials.isPending && <LoadingState label="Loading travel trials…" />}
      {trials.isError && <ErrorState error={trials.error} onRetry={() => trials.refetch()} />}
      {trials.data && !shownId && (
        <EmptyState title="No travel trial yet">
          Record commanded and measured moves to check and correct the steps per mm.
        </EmptyState>
      )}
      {shownId && shown.isPending && <LoadingState label="Loading the trial…" />}
      {shownId && shown.isError && <ErrorState error={shown.error} onRetry={() => shown.refetch()} />}
      {shown.data && <TravelTrialResult axis={axis} trial={shown.data} mayApply={mayRecord} />}
      <TravelTrialHistory
        trials={list}
        selectedId={shownId}
        onSelect={setSelected}
        hasOlder={trials.hasNextPage}
        loadingOlder={trials.isFetchingNextPage}
        onLoadOlder={() => trials.fetchNextPage()}
      />
    </Stack>
  );
}
