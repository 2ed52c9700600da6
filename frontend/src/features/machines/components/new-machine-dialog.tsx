import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { paths } from '../../../config/paths';
import { useCreateMachine } from '../api/create-machine';
import { useTargetSetChoices } from '../api/get-target-set-choices';
import { emptyMachineForm, MachineFormFields, machineFormErrors, toMachineInput } from './machine-form-fields';

/** Opens a new machine file and goes to it. */
export function NewMachineDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const [values, setValues] = useState(emptyMachineForm);
  const [tried, setTried] = useState(false);
  const create = useCreateMachine();
  const sets = useTargetSetChoices();
  const navigate = useNavigate();

  const close = () => {
    setValues(emptyMachineForm);
    setTried(false);
    create.reset();
    onClose();
  };
  const submit = () => {
    setTried(true);
    if (Object.keys(machineFormErrors(values)).length) return;
    create.mutate(toMachineInput(values), {
      onSuccess: (m) => {
        close();
        navigate(paths.machine(m.id));
      },
    });
  };

  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="sm">
      <DialogTitle>New machine</DialogTitle>
      <DialogContent>
        {create.error && (
          <Alert severity="error" sx={{ mb: 1 }}>
            {create.error.message}
          </Alert>
        )}
        <MachineFormFields
          values={values}
          onChange={setValues}
          targetSets={sets.data ?? []}
          showErrors={tried}
          autoFocus
        />
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={create.isPending}>
          Open machine file
        </Button>
      </DialogActions>
    </Dialog>
  );
}
