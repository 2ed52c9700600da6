import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useUpdateMachine } from '../api/update-machine';
import { useTargetSetChoices } from '../api/get-target-set-choices';
import type { Machine } from '../types';
import { MachineFormFields } from './machine-form-fields';
import { machineFormOf, machineFormSchema, toMachineInput, type MachineFormValues } from './machine-form-schema';

export function EditMachineDialog({
  machine,
  open,
  onClose,
}: {
  machine: Machine;
  open: boolean;
  onClose: () => void;
}) {
  const form = useForm<MachineFormValues>({
    defaultValues: machineFormOf(machine),
    resolver: zodResolver(machineFormSchema),
  });
  const update = useUpdateMachine(machine.id);
  const sets = useTargetSetChoices();

  const close = () => {
    update.reset();
    // What was typed stays until the dialog opens again (then it starts from the machine as saved);
    // only the messages of the last try go at once.
    form.reset(undefined, { keepValues: true });
    onClose();
  };
  const submit = form.handleSubmit((values) => update.mutate(toMachineInput(values), { onSuccess: close }));

  return (
    // A stray click beside the form (or one that lands as a menu closes) must not throw away what was typed: Cancel or Escape closes it.
    <Dialog
      open={open}
      onClose={(_e, reason) => reason !== 'backdropClick' && close()}
      fullWidth
      maxWidth="sm"
      slotProps={{ transition: { onEnter: () => form.reset(machineFormOf(machine)) } }}
    >
      <DialogTitle>Edit specification</DialogTitle>
      <DialogContent>
        {update.error && (
          <Alert severity="error" sx={{ mb: 1 }}>
            {update.error.message}
          </Alert>
        )}
        <MachineFormFields form={form} targetSets={sets.data ?? []} />
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={update.isPending || form.formState.isSubmitting}>
          Save specification
        </Button>
      </DialogActions>
    </Dialog>
  );
}
