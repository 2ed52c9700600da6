import { Alert, Box, Button, IconButton, LinearProgress, List, ListItem, Typography } from '@mui/material';
import CheckCircleOutline from '@mui/icons-material/CheckCircleOutlined';
import Close from '@mui/icons-material/Close';
import type { UploadItem } from '../hooks/use-upload-queue';
import { formatBytes } from '../utils/format-bytes';

interface Props {
  items: UploadItem[];
  onCancel: (key: string) => void;
  onDismiss: (key: string) => void;
  onClearFinished: () => void;
}

/** One row per file: waiting for the connection, a progress bar while it goes, then attached or why it was refused. */
export function UploadList({ items, onCancel, onDismiss, onClearFinished }: Props) {
  if (!items.length) return null;
  const finished = items.some((i) => i.status !== 'uploading' && i.status !== 'waiting');
  return (
    <Box sx={{ mt: 1.5 }}>
      <List dense disablePadding aria-label="Uploads">
        {items.map((item) => (
          <ListItem key={item.key} disableGutters sx={{ display: 'block', py: 0.75 }}>
            {item.status === 'refused' || item.status === 'cancelled' ? (
              <Alert
                severity={item.status === 'refused' ? 'error' : 'info'}
                onClose={() => onDismiss(item.key)}
                sx={{ py: 0, '& .MuiAlert-message': { overflowWrap: 'anywhere' } }}
              >
                {item.status === 'refused' ? <strong>Not attached: </strong> : null}
                {item.message}
              </Alert>
            ) : (
              <UploadRow item={item} onCancel={onCancel} />
            )}
          </ListItem>
        ))}
      </List>
      {finished && (
        <Button size="small" onClick={onClearFinished}>
          Clear finished
        </Button>
      )}
    </Box>
  );
}

function UploadRow({ item, onCancel }: { item: UploadItem; onCancel: (key: string) => void }) {
  const percent = Math.round(item.progress * 100);
  const done = item.status === 'done';
  const waiting = item.status === 'waiting';
  return (
    <Box>
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1 }}>
        <Typography
          variant="body2"
          sx={{ flex: 1, minWidth: 0, overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap' }}
        >
          {item.name}
        </Typography>
        <Typography
          variant="body2"
          color={done ? 'success.main' : 'text.secondary'}
          sx={{ display: 'flex', alignItems: 'center', gap: 0.5, whiteSpace: 'nowrap' }}
        >
          {done ? <CheckCircleOutline fontSize="small" /> : null}
          {done
            ? `Attached · ${formatBytes(item.sizeBytes)}`
            : waiting
              ? `Waiting to be sent · ${formatBytes(item.sizeBytes)}`
              : `${percent} % of ${formatBytes(item.sizeBytes)}`}
        </Typography>
        {!done && (
          <IconButton size="small" aria-label={`Cancel ${item.name}`} onClick={() => onCancel(item.key)}>
            <Close fontSize="small" />
          </IconButton>
        )}
      </Box>
      <LinearProgress
        variant="determinate"
        value={waiting ? 0 : percent}
        aria-valuetext={waiting ? 'Waiting to be sent' : undefined}
        color={done ? 'success' : 'primary'}
        aria-label={`Upload of ${item.name}`}
        sx={{ height: 6, borderRadius: 3, mt: 0.5, '& .MuiLinearProgress-bar': done ? { transition: 'none' } : {} }}
      />
    </Box>
  );
}
