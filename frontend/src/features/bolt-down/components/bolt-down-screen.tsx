import { useState } from 'react';
import { Box, Button, MenuItem, TextField } from '@mui/material';
import { ErrorState } from '../../../components/states/error-state';
import { LoadingState } from '../../../components/states/loading-state';
import { EmptyState } from '../../../components/states/empty-state';
import { useBoltDown } from '../api/get-bolt-down';
import { useBoltDowns } from '../api/get-bolt-downs';
import type { RailSummary } from '../types';
import { BoltDownGuide } from './bolt-down-guide';
import { StartBoltDownForm } from './start-bolt-down-form';
import { AbandonBoltDownDialog } from './abandon-bolt-down-dialog';
import { formatDateTime } from '../../../lib/format-time';

interface Props {
  rail: RailSummary;
  canRecord: boolean;
}

/** The rail's latest bolt-down (or an earlier one picked), or the form to begin one. */
export function BoltDownScreen({ rail, canRecord }: Props) {
  const list = useBoltDowns(rail.id);
  const [chosen, setChosen] = useState<string | null>(null);
  const [starting, setStarting] = useState(false);
  const [abandoning, setAbandoning] = useState(false);
  const id = chosen ?? list.data?.[0]?.id;
  const bd = useBoltDown(starting ? undefined : id);

  if (list.isPending) return <LoadingState label="Loading the bolt-down…" />;
  if (list.isError && !list.data) return <ErrorState error={list.error} onRetry={() => list.refetch()} />;
  if (starting || !id) {
    if (!canRecord)
      return <EmptyState title="No bolt-down yet">Nobody has begun fixing this rail down with the guide.</EmptyState>;
    return (
      <StartBoltDownForm
        rail={rail}
        onStarted={(started) => {
          setChosen(started.id);
          setStarting(false);
        }}
      />
    );
  }
  // Keep showing what is known while the connection is down: the list holds each bolt-down too.
  const shown = bd.data ?? list.data?.find((b) => b.id === id);
  if (!shown && bd.isPending) return <LoadingState label="Loading the bolt-down…" />;
  if (!shown) return <ErrorState error={bd.error} onRetry={() => bd.refetch()} />;

  const others = list.data ?? [];
  const over = !!shown.finalSweepId || !!shown.abandoned;
  return (
    <>
      {(others.length > 1 || canRecord) && (
        <Box sx={{ display: 'flex', gap: 2, flexWrap: 'wrap', alignItems: 'center', mb: 2 }}>
          {others.length > 1 && (
            <TextField
              select
              label="Bolt-down"
              value={shown.id}
              onChange={(e) => setChosen(e.target.value)}
              sx={{ minWidth: 300 }}
            >
              {others.map((b, i) => (
                <MenuItem key={b.id} value={b.id}>
                  {formatDateTime(b.createdAt)} · {b.fixedCount} of {b.holeCount} fixed
                  {b.abandoned ? ' · abandoned' : ''}
                  {i === 0 ? ' (latest)' : ''}
                </MenuItem>
              ))}
            </TextField>
          )}
          {canRecord && over && (
            <Button variant="outlined" onClick={() => setStarting(true)}>
              Begin a new bolt-down
            </Button>
          )}
          {canRecord && !over && (
            <Button color="warning" onClick={() => setAbandoning(true)} sx={{ ml: { sm: 'auto' } }}>
              Abandon this bolt-down…
            </Button>
          )}
        </Box>
      )}
      {canRecord && !over && abandoning && (
        <AbandonBoltDownDialog bd={shown} open onClose={() => setAbandoning(false)} />
      )}
      <BoltDownGuide key={shown.id} bd={shown} canRecord={canRecord} typicalBoltSize={rail.typicalBoltSize} />
    </>
  );
}
