import { useState } from 'react';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { useWaiveCheck } from '../api/waive-check';
import { resultText, targetText } from '../format';
import { KIND_LABELS, STATUS_LABELS, type BoardCheck } from '../types';

const MIN_REASON = 10;

/** An owner lets one check pass with a written reason, kept on the record and printed. */
export function WaiverDialog({
  machineId,
  check,
  onClose,
}: {
  machineId: string;
  check: BoardCheck | null;
  onClose: () => void;
}) {
  const [reason, setReason] = useState('');
  const waive = useWaiveCheck(machineId);
  const close = () => {
    setReason('');
    waive.reset();
    onClose();
  };
  const short = reason.trim().length < MIN_REASON;
  return (
    <Dialog open={!!check} onClose={close} fullWidth maxWidth="sm">
      <DialogTitle>Waive a check</DialogTitle>
      {check && (
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            <Typography>
              <strong>{KIND_LABELS[check.kind]}</strong> of {check.subject}: {STATUS_LABELS[check.status].toLowerCase()}
              {check.result ? `, ${resultText(check.result)} against ${targetText(check.kind, check.target)}` : ''}.
            </Typography>
            <Typography variant="body2" color="text.secondary">
              The waiver belongs to this result: if the check is recorded again, it needs a new waiver. The reason is
              printed on the certificate.
            </Typography>
            {waive.error && <Alert severity="error">{waive.error.message}</Alert>}
            <TextField
              label="Reason"
              value={reason}
              onChange={(e) => setReason(e.target.value)}
              multiline
              minRows={3}
              required
              autoFocus
              helperText={
                short ? `Say why, in at least ${MIN_REASON} characters` : `${reason.trim().length} characters`
              }
            />
          </Stack>
        </DialogContent>
      )}
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button
          variant="contained"
          disabled={short || waive.isPending}
          onClick={() => check && waive.mutate({ checkKey: check.key, reason: reason.trim() }, { onSuccess: close })}
        >
          Waive with this reason
        </Button>
      </DialogActions>
    </Dialog>
  );
}
