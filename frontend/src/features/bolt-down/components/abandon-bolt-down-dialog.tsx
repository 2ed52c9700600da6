import { useState, type FormEvent } from 'react';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  TextField,
} from '@mui/material';
import { useOnline } from '../../../components/offline/use-online';
import { useAbandonBoltDown } from '../api/abandon-bolt-down';
import type { BoltDown } from '../types';

const MIN_REASON = 3;

/** Asks why before a bolt-down is given up; the reason is kept with it and in the history. */
export function AbandonBoltDownDialog({ bd, open, onClose }: { bd: BoltDown; open: boolean; onClose: () => void }) {
  const [reason, setReason] = useState('');
  const [touched, setTouched] = useState(false);
  const abandon = useAbandonBoltDown(bd);
  const online = useOnline();
  const short = reason.trim().length < MIN_REASON;

  function submit(e: FormEvent) {
    e.preventDefault();
    setTouched(true);
    if (short || abandon.isPending) return;
    abandon.mutate(reason.trim(), { onSuccess: onClose });
  }

  return (
    <Dialog
      open={open}
      onClose={onClose}
      fullWidth
      maxWidth="sm"
      slotProps={{ paper: { component: 'form', onSubmit: submit, noValidate: true } as object }}
    >
      <DialogTitle>Abandon this bolt-down?</DialogTitle>
      <DialogContent>
        <DialogContentText sx={{ mb: 2 }}>
          {bd.fixedCount} of {bd.holeCount} holes are fixed. No more holes can be fixed in it afterwards; what was
          recorded stays in the history, and a new bolt-down of rail {bd.rail.label} can begin.
        </DialogContentText>
        <TextField
          autoFocus
          fullWidth
          multiline
          minRows={2}
          label="Why is it abandoned?"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          onBlur={() => setTouched(true)}
          error={touched && short}
          helperText={
            touched && short
              ? `Say why, in at least ${MIN_REASON} characters`
              : 'Kept with the bolt-down, e.g. “rail lifted to clean a burr off the reference face”'
          }
          slotProps={{ htmlInput: { maxLength: 1000 } }}
        />
        {!online && (
          <Alert severity="warning" sx={{ mt: 2 }}>
            Abandoning needs the connection; it is not kept on this device.
          </Alert>
        )}
        {abandon.error && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {abandon.error.message}
          </Alert>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Keep working</Button>
        <Button type="submit" color="warning" variant="contained" disabled={abandon.isPending || !online}>
          {abandon.isPending ? 'Abandoning…' : 'Abandon bolt-down'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
