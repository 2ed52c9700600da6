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
import { useReopenMachine } from '../api/reopen-machine';
import { dateOnly } from '../format';
import type { Approval } from '../types';

const MIN_REASON = 10;

/** The owner takes back the approval to change the machine: a written reason, kept in the history and mailed. */
export function ReopenDialog({
  machineId,
  machineName,
  approval,
  onClose,
}: {
  machineId: string;
  machineName: string;
  approval: Approval;
  onClose: () => void;
}) {
  const [reason, setReason] = useState('');
  const [touched, setTouched] = useState(false);
  const reopen = useReopenMachine(machineId);
  const length = reason.trim().length;
  const short = length < MIN_REASON;
  const close = () => {
    if (reopen.isPending) return;
    reopen.reset();
    onClose();
  };
  const send = () => {
    setTouched(true);
    if (short || reopen.isPending) return;
    reopen.mutate({ reason: reason.trim() }, { onSuccess: onClose });
  };
  return (
    <Dialog open onClose={close} fullWidth maxWidth="sm" aria-labelledby="reopen-title">
      <DialogTitle id="reopen-title">Reopen {machineName} for changes</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          <Typography>
            The approval signed by {approval.approvedBy} on {dateOnly(approval.approvedAt)} will no longer stand: the
            machine is not ready to cut until its changed checks are recorded and it is approved again.
          </Typography>
          <Typography variant="body2" color="text.secondary">
            The reason is kept in the machine’s history and e-mailed to the people who work on it. The signed
            certificate stays as it was, and its public check will show the approval as reopened.
          </Typography>
          {reopen.error && <Alert severity="error">{reopen.error.message}</Alert>}
          <TextField
            label="Reason for reopening"
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            onBlur={() => setTouched(true)}
            multiline
            minRows={3}
            required
            autoFocus
            disabled={reopen.isPending}
            error={touched && short}
            helperText={
              short
                ? `Say what is to be changed and why, in at least ${MIN_REASON} characters (${length} so far)`
                : `${length} characters`
            }
          />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close} disabled={reopen.isPending}>
          Cancel
        </Button>
        <Button variant="contained" color="warning" disabled={short || reopen.isPending} onClick={send}>
          {reopen.isPending ? 'Reopening…' : 'Reopen for changes'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
