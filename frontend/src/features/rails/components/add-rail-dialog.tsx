import { useState } from 'react';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useCreateRail } from '../api/create-rail';
import type { Rail } from '../types';
import { emptyRailForm, RailFormFields, railFormErrors, toRailInput } from './rail-form-fields';

export function AddRailDialog({ machineId, rails, open, onClose }: { machineId: string; rails: Rail[]; open: boolean; onClose: () => void }) {
  const [values, setValues] = useState(emptyRailForm);
  const [tried, setTried] = useState(false);
  const create = useCreateRail(machineId);
  const close = () => {
    setValues(emptyRailForm);
    setTried(false);
    create.reset();
    onClose();
  };
  const submit = () => {
    setTried(true);
    if (Object.keys(railFormErrors(values)).length) return;
    create.mutate(toRailInput(values), { onSuccess: close });
  };
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="sm">
      <DialogTitle>Add rail</DialogTitle>
      <DialogContent>
        {create.error && <Alert severity="error" sx={{ mb: 1 }}>{create.error.message}</Alert>}
        <RailFormFields values={values} onChange={setValues} others={rails} showErrors={tried} />
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={create.isPending}>
          Add rail
        </Button>
      </DialogActions>
    </Dialog>
  );
}
