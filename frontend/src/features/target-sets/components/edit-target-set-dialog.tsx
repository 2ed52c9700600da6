import { useEffect } from 'react';
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
  Typography,
} from '@mui/material';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { typedNumber } from '../../../lib/form-number';
import { TargetSetUsers } from './target-set-users';
import { useUpdateTargetSet } from '../api/update-target-set';
import {
  REFERENCE_WORDS,
  unitChoices,
  UNIT_WORDS,
  type StraightnessReference,
  type TargetKey,
  type TargetSet,
  type TargetUnit,
} from '../types';

const REFERENCES = Object.keys(REFERENCE_WORDS) as StraightnessReference[];

/** The set as typed: a name, and for every target its value (as typed), unit, source and reference. */
const targetSetFormSchema = z.object({
  name: z.string().refine((s) => s.trim() !== '', 'A name is needed'),
  targets: z.record(
    z.string(),
    z.object({
      value: z.string().refine((s) => typedNumber(s) >= 0, 'A number of 0 or more'),
      unit: z.enum(Object.keys(UNIT_WORDS) as TargetUnit[]),
      source: z.string(),
      reference: z.enum(REFERENCES).optional(),
    }),
  ),
});
type TargetSetFormValues = z.input<typeof targetSetFormSchema>;
type Draft = TargetSetFormValues['targets'];

const draftOf = (set: TargetSet): Draft =>
  Object.fromEntries(
    Object.entries(set.targets).map(([k, t]) => [
      k,
      {
        value: String(t.value),
        unit: t.unit,
        source: t.source ?? '',
        ...(k === 'railStraightness' ? { reference: t.reference ?? 'minimum-zone' } : {}),
      },
    ]),
  );

/** Owners and admins change tolerances; each keeps its unit and a note of where it came from. */
export function EditTargetSetDialog({ set, onClose }: { set: TargetSet; onClose: () => void }) {
  const draft = draftOf(set);
  // Checked as it is typed, and from the start, with the button held until every field is right.
  const form = useForm<TargetSetFormValues>({
    mode: 'onChange',
    defaultValues: { name: set.name, targets: draft },
    resolver: zodResolver(targetSetFormSchema),
  });
  useEffect(() => {
    void form.trigger();
  }, [form]);
  const update = useUpdateTargetSet(set.id);
  const bad = Object.keys(form.formState.errors).length > 0;

  const save = form.handleSubmit((values) => {
    const targets = Object.fromEntries(
      Object.entries(values.targets).map(([k, d]) => [
        k,
        {
          value: typedNumber(d.value),
          unit: d.unit,
          ...(d.source.trim() ? { source: d.source.trim() } : {}),
          ...(d.reference ? { reference: d.reference } : {}),
        },
      ]),
    );
    update.mutate({ name: values.name.trim(), targets }, { onSuccess: onClose });
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md">
      <DialogTitle>Edit {set.name}</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          {update.error && <Alert severity="error">{update.error.message}</Alert>}
          <TargetSetUsers set={set} />
          <FormTextField form={form} name="name" label="Name" />
          {Object.entries(draft).map(([key, d]) => {
            const t = set.targets[key as TargetKey];
            return (
              <Stack key={key} spacing={1} sx={{ pb: 1.5, borderBottom: 1, borderColor: 'divider' }}>
                <Typography sx={{ fontWeight: 500 }}>{t.label}</Typography>
                <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
                  <FormTextField
                    form={form}
                    name={`targets.${key}.value`}
                    label={`${t.label}: value`}
                    sx={{ width: { sm: 160 } }}
                    slotProps={{ htmlInput: { inputMode: 'decimal' } }}
                  />
                  <Controller
                    name={`targets.${key}.unit`}
                    control={form.control}
                    render={({ field }) => (
                      <TextField
                        select
                        label="Unit"
                        value={field.value}
                        onChange={(e) => field.onChange(e.target.value as TargetUnit)}
                        sx={{ width: { sm: field.value === 'um/mm' ? 260 : 110 } }}
                      >
                        {unitChoices(t.unit).map((u) => (
                          <MenuItem key={u} value={u}>
                            {UNIT_WORDS[u]}
                          </MenuItem>
                        ))}
                      </TextField>
                    )}
                  />
                  {d.reference && (
                    <Controller
                      name={`targets.${key}.reference`}
                      control={form.control}
                      render={({ field }) => (
                        <TextField
                          select
                          label="Judged on"
                          value={field.value}
                          onChange={(e) => field.onChange(e.target.value as StraightnessReference)}
                          sx={{ minWidth: { sm: 200 } }}
                        >
                          {REFERENCES.map((r) => (
                            <MenuItem key={r} value={r}>
                              {REFERENCE_WORDS[r]}
                            </MenuItem>
                          ))}
                        </TextField>
                      )}
                    />
                  )}
                  <FormTextField form={form} name={`targets.${key}.source`} label="Where it comes from" fullWidth />
                </Stack>
              </Stack>
            );
          })}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" onClick={save} disabled={update.isPending || bad}>
          Save targets
        </Button>
      </DialogActions>
    </Dialog>
  );
}
