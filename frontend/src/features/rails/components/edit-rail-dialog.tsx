import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useUpdateRail } from '../api/update-rail';
import type { Rail } from '../types';
import { RailFormFields } from './rail-form-fields';
import { railFormOf, railFormSchema, toRailInput, type RailFormValues } from './rail-form-schema';

export function EditRailDialog({ rail, others, onClose }: { rail: Rail; others: Rail[]; onClose: () => void }) {
  const form = useForm<RailFormValues>({ defaultValues: railFormOf(rail), resolver: zodResolver(railFormSchema) });
  const update = useUpdateRail(rail.id);
  const submit = form.handleSubmit((values) => {
    const input = toRailInput(values);
    update.mutate({ ...input, ...(values.profileSize ? {} : { profileSize: undefined }) }, { onSuccess: onClose });
  });
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <DialogTitle>Edit rail {rail.label}</DialogTitle>
      <DialogContent>
        {update.error && (
          <Alert severity="error" sx={{ mb: 1 }}>
            {update.error.message}
          </Alert>
        )}
        <RailFormFields form={form} others={others.filter((r) => r.id !== rail.id)} />
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={update.isPending || form.formState.isSubmitting}>
          Save rail
        </Button>
      </DialogActions>
    </Dialog>
  );
}
