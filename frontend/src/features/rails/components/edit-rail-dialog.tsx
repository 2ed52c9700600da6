import { useState } from 'react';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useUpdateRail } from '../api/update-rail';
import type { Rail } from '../types';
import { RailFormFields, railFormErrors, railFormOf, toRailInput } from './rail-form-fields';

export function EditRailDialog({ rail, others, onClose }: { rail: Rail; others: Rail[]; onClose: () => void }) {
  const [values, setValues] = useState(() => railFormOf(rail));
  const [tried, setTried] = useState(false);
  const update = useUpdateRail(rail.id);
  const submit = () => {
    setTried(true);
    if (Object.keys(railFormErrors(values)).length) return;
    const input = toRailInput(values);
    update.mutate({ ...input, ...(values.profileSize ? {} : { profileSize: undefined }) }, { onSuccess: onClose });
  };
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <DialogTitle>Edit rail {rail.label}</DialogTitle>
      <DialogContent>
        {update.error && <Alert severity="error" sx={{ mb: 1 }}>{update.error.message}</Alert>}
        <RailFormFields values={values} onChange={setValues} others={others.filter((r) => r.id !== rail.id)} showErrors={tried} />
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={update.isPending}>
          Save rail
        </Button>
      </DialogActions>
    </Dialog>
  );
}
