import { List, ListItem, ListItemText, Paper, Typography } from '@mui/material';
import { useMachineHistory } from '../api/get-machine-history';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { EmptyState } from '../../../components/states/empty-state';

/** The audit history: who changed what, when. */
export function MachineHistory({ machineId }: { machineId: string }) {
  const history = useMachineHistory(machineId);
  if (history.isPending) return <LoadingState label="Loading history…" />;
  if (history.isError) return <ErrorState error={history.error} onRetry={() => history.refetch()} />;
  if (!history.data.length) return <EmptyState title="No changes yet" />;
  return (
    <Paper>
      <List dense aria-label="History">
        {history.data.map((e) => (
          <ListItem key={e.id} divider>
            <ListItemText
              primary={e.summary || `${e.recordType} ${e.action}`}
              secondary={
                <Typography component="span" variant="body2" color="text.secondary">
                  {new Date(e.at).toLocaleString()} · {e.actor} · {e.recordType} {e.action}
                </Typography>
              }
            />
          </ListItem>
        ))}
      </List>
    </Paper>
  );
}
