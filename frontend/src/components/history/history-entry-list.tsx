import { Box, Button, Chip, List, ListItem, Paper, Stack, Typography } from '@mui/material';
import type { HistoryEntry } from './history-types';
import { formatDateTime } from '../../lib/format-time';

const show = (v: unknown): string => {
  if (v === null || v === undefined || v === '') return '—';
  if (typeof v === 'object') {
    const text = JSON.stringify(v);
    return text.length > 60 ? `${text.slice(0, 57)}…` : text;
  }
  return String(v);
};

function ChangeLines({ entry }: { entry: HistoryEntry }) {
  if (!entry.fieldChanges.length) return null;
  return (
    <Box
      component="ul"
      aria-label="Values changed"
      sx={{ m: 0, mt: 0.5, pl: 2.5, color: 'text.secondary', typography: 'caption', wordBreak: 'break-word' }}
    >
      {entry.fieldChanges.map((c, i) => (
        <li key={i}>
          {c.record} · {c.field}:{' '}
          {c.operation === 'created'
            ? show(c.after)
            : c.operation === 'deleted'
              ? `${show(c.before)} (deleted)`
              : `${show(c.before)} → ${show(c.after)}`}
        </li>
      ))}
    </Box>
  );
}

/** A page-by-page history: newest first, who, when (with the zone), what, and every value changed. */
export function HistoryEntryList(props: {
  entries: HistoryEntry[];
  hasMore: boolean;
  loadingMore: boolean;
  onLoadMore: () => void;
  showMachine?: boolean;
}) {
  return (
    <Paper>
      <List aria-label="History" sx={{ py: 0 }}>
        {props.entries.map((e) => (
          <ListItem key={e.id} divider sx={{ display: 'block', py: 1.25 }}>
            <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 0.5 }}>
              <Chip size="small" variant="outlined" label={e.kind} />
              {props.showMachine && e.machine && <Chip size="small" label={e.machine.name} />}
              <Typography variant="body2" color="text.secondary">
                {formatDateTime(e.at)} · <strong>{e.actor}</strong>
              </Typography>
            </Stack>
            <Typography variant="body1" sx={{ mt: 0.5, wordBreak: 'break-word' }}>
              {e.summary}
            </Typography>
            <ChangeLines entry={e} />
          </ListItem>
        ))}
      </List>
      {props.hasMore && (
        <Box sx={{ p: 1.5, textAlign: 'center' }}>
          <Button variant="outlined" onClick={props.onLoadMore} disabled={props.loadingMore}>
            {props.loadingMore ? 'Loading…' : 'Load more'}
          </Button>
        </Box>
      )}
    </Paper>
  );
}
