import { useState } from 'react';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useUpdateMachine } from '../api/update-machine';
import { useTargetSetChoices } from '../api/get-target-set-choices';
import type { Machine } from '../types';
import { MachineFormFields, machineFormErrors, toMachineInput, type MachineFormValues } from './machine-form-fields';

const fromMachine = (m: Machine): MachineFormValues => ({
  name: m.name,
  kind: m.kind,
  lengthUnit: m.lengthUnit,
  x: String(m.workAreaInLengthUnit.x),
  y: String(m.workAreaInLengthUnit.y),
  notes: m.notes,
  targetSetId: m.targetSet.id,
});

export function EditMachineDialog({
  machine,
  open,
  onClose,
}: {
  machine: Machine;
  open: boolean;
  onClose: () => void;
}) {
  const [values, setValues] = useState(() => fromMachine(machine));
  const [tried, setTried] = useState(false);
  const update = useUpdateMachine(machine.id);
  const sets = useTargetSetChoices();

  const close = () => {
    update.reset();
    setTried(false);
    onClose();
  };
  const submit = () => {
    setTried(true);
    if (Object.keys(machineFormErrors(values)).length) return;
    update.mutate(toMachineInput(values), { onSuccess: close });
  };

  return (
    // A stray click beside the form (or one that lands as a menu closes) must not throw away what was typed: Cancel or Escape closes it.
    <Dialog
      open={open}
      onClose={(_e, reason) => reason !== 'backdropClick' && close()}
      fullWidth
      maxWidth="sm"
      slotProps={{ transition: { onEnter: () => setValues(fromMachine(machine)) } }}
    >
      <DialogTitle>Edit specification</DialogTitle>
      <DialogContent>
        {update.error && (
          <Alert severity="error" sx={{ mb: 1 }}>
            {update.error.message}
          </Alert>
        )}
        <MachineFormFields values={values} onChange={setValues} targetSets={sets.data ?? []} showErrors={tried} />
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={update.isPending}>
          Save specification
        </Button>
      </DialogActions>
    </Dialog>
  );
}
