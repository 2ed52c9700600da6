import { useNavigate } from 'react-router-dom';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { paths } from '../../../config/paths';
import { useCreateMachine } from '../api/create-machine';
import { useTargetSetChoices } from '../api/get-target-set-choices';
import { MachineFormFields } from './machine-form-fields';
import { emptyMachineForm, machineFormSchema, toMachineInput, type MachineFormValues } from './machine-form-schema';

/** Opens a new machine file and goes to it. */
export function NewMachineDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const form = useForm<MachineFormValues>({
    defaultValues: emptyMachineForm,
    resolver: zodResolver(machineFormSchema),
  });
  const create = useCreateMachine();
  const sets = useTargetSetChoices();
  const navigate = useNavigate();

  const close = () => {
    form.reset(emptyMachineForm);
    create.reset();
    onClose();
  };
  const submit = form.handleSubmit((values) =>
    create.mutate(toMachineInput(values), {
      onSuccess: (m) => {
        close();
        navigate(paths.machine(m.id));
      },
    }),
  );

  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="sm">
      <DialogTitle>New machine</DialogTitle>
      <DialogContent>
        {create.error && (
          <Alert severity="error" sx={{ mb: 1 }}>
            {create.error.message}
          </Alert>
        )}
        <MachineFormFields form={form} targetSets={sets.data ?? []} autoFocus />
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={create.isPending || form.formState.isSubmitting}>
          Open machine file
        </Button>
      </DialogActions>
    </Dialog>
  );
}
