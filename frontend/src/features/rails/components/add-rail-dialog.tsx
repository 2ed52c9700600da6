import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useCreateRail } from '../api/create-rail';
import type { Rail } from '../types';
import { RailFormFields } from './rail-form-fields';
import { emptyRailForm, railFormSchema, toRailInput, type RailFormValues } from './rail-form-schema';

export function AddRailDialog({
  machineId,
  rails,
  open,
  onClose,
}: {
  machineId: string;
  rails: Rail[];
  open: boolean;
  onClose: () => void;
}) {
  const form = useForm<RailFormValues>({ defaultValues: emptyRailForm, resolver: zodResolver(railFormSchema) });
  const create = useCreateRail(machineId);
  const close = () => {
    form.reset(emptyRailForm);
    create.reset();
    onClose();
  };
  const submit = form.handleSubmit((values) => create.mutate(toRailInput(values), { onSuccess: close }));
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="sm">
      <DialogTitle>Add rail</DialogTitle>
      <DialogContent>
        {create.error && (
          <Alert severity="error" sx={{ mb: 1 }}>
            {create.error.message}
          </Alert>
        )}
        <RailFormFields form={form} others={rails} />
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={create.isPending || form.formState.isSubmitting}>
          Add rail
        </Button>
      </DialogActions>
    </Dialog>
  );
}
