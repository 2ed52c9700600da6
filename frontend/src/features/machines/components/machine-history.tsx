import { List, ListItem, ListItemText, Paper, Stack, Typography } from '@mui/material';
import { useMachineHistory } from '../api/get-machine-history';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { EmptyState } from '../../../components/states/empty-state';
import type { HistoryEntry } from '../types';

const short = (v: unknown): string => {
  if (v === null || v === undefined) return '—';
  if (typeof v === 'object') {
    const o = v as Record<string, unknown>;
    if ('name' in o && typeof o.name === 'string') return o.name;
    if ('x' in o && 'y' in o) return `${o.x} × ${o.y} mm`;
    const text = JSON.stringify(v);
    return text.length > 80 ? `${text.slice(0, 77)}…` : text;
  }
  return String(v);
};

/** "state: ready-to-cut → being-built", one line per changed field. */
function changeLines(changes: HistoryEntry['changes']): string[] {
  if (!changes) return [];
  return Object.entries(changes).map(([key, v]) => {
    if (v && typeof v === 'object' && 'from' in v && 'to' in v) {
      const c = v as { from: unknown; to: unknown };
      return `${key}: ${short(c.from)} → ${short(c.to)}`;
    }
    return `${key}: ${short(v)}`;
  });
}

/** The audit history: who changed what, when. */
export function MachineHistory({ machineId }: { machineId: string }) {
  const history = useMachineHistory(machineId);
  if (history.isPending) return <LoadingState label="Loading history…" />;
  if (history.isError) return <ErrorState error={history.error} onRetry={() => history.refetch()} />;
  if (!history.data.length) return <EmptyState title="No changes yet" />;
  return (
    <Paper>
      <List dense aria-label="History">
        {history.data.map((e) => {
          const lines = changeLines(e.changes);
          return (
            <ListItem key={e.id} divider alignItems="flex-start">
              <ListItemText
                primary={e.summary || `${e.recordType} ${e.action}`}
                secondary={
                  <Stack component="span" spacing={0.25}>
                    <Typography component="span" variant="body2" color="text.secondary">
                      {new Date(e.at).toLocaleString()} · <strong>{e.actor}</strong> · {e.recordType} {e.action}
                    </Typography>
                    {lines.map((l) => (
                      <Typography key={l} component="span" variant="caption" color="text.secondary" sx={{ fontFamily: 'monospace', wordBreak: 'break-word' }}>
                        {l}
                      </Typography>
                    ))}
                  </Stack>
                }
              />
            </ListItem>
          );
        })}
      </List>
    </Paper>
  );
}
