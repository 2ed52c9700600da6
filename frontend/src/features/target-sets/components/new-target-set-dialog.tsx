import { useEffect, useMemo } from 'react';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  MenuItem,
  Stack,
  TextField,
} from '@mui/material';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { useCreateTargetSet } from '../api/create-target-set';
import type { TargetSet } from '../types';

/** The new set as typed; its name must be free among the workshop's sets. */
const newTargetSetSchema = (sets: TargetSet[]) =>
  z.object({ sourceId: z.string(), name: z.string(), description: z.string() }).superRefine((v, ctx) => {
    const trimmed = v.name.trim();
    const taken = sets.some((s) => s.name.trim().toLowerCase() === trimmed.toLowerCase());
    const problem = !trimmed
      ? 'A name is needed'
      : taken
        ? 'Another target set has this name'
        : trimmed.length > 120
          ? 'At most 120 characters'
          : null;
    if (problem) ctx.addIssue({ code: 'custom', path: ['name'], message: problem });
  });
type NewTargetSetValues = z.input<ReturnType<typeof newTargetSetSchema>>;

/**
 * A new target set starts as a copy of an existing one (every target needs a value, so there is
 * always a starting point); its values are then edited like any set's.
 */
export function NewTargetSetDialog({
  sets,
  from,
  onClose,
  onCreated,
}: {
  sets: TargetSet[];
  from: TargetSet;
  onClose: () => void;
  onCreated: (id: string) => void;
}) {
  const schema = useMemo(() => newTargetSetSchema(sets), [sets]);
  // Checked as it is typed, and from the start: the name offered may already be taken.
  const form = useForm<NewTargetSetValues>({
    mode: 'onChange',
    defaultValues: { sourceId: from.id, name: `${from.name} (copy)`, description: from.description },
    resolver: zodResolver(schema),
  });
  useEffect(() => {
    void form.trigger('name');
  }, [form, schema]);
  const create = useCreateTargetSet();
  const save = form.handleSubmit(({ sourceId, name, description }) =>
    create.mutate(
      { from: sets.find((s) => s.id === sourceId) ?? from, name: name.trim(), description: description.trim() },
      { onSuccess: (made) => onCreated(made.id) },
    ),
  );
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="new-target-set-title">
      <DialogTitle id="new-target-set-title">New target set</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          {create.error && <Alert severity="error">{create.error.message}</Alert>}
          <Controller
            name="sourceId"
            control={form.control}
            render={({ field }) => (
              <TextField
                select
                label="Start from"
                value={field.value}
                onChange={field.onChange}
                helperText="Every target, its unit and its source are copied; change them afterwards."
              >
                {sets.map((s) => (
                  <MenuItem key={s.id} value={s.id}>
                    {s.name}
                  </MenuItem>
                ))}
              </TextField>
            )}
          />
          <FormTextField form={form} name="name" label="Name" helperText=" " autoFocus />
          <FormTextField form={form} name="description" label="Description" multiline minRows={2} />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" onClick={save} disabled={create.isPending || !!form.formState.errors.name}>
          {create.isPending ? 'Making…' : 'Make target set'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
