import { useState } from 'react';
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

type Draft = Record<string, { value: string; unit: TargetUnit; source: string; reference?: StraightnessReference }>;

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
  const [name, setName] = useState(set.name);
  const [draft, setDraft] = useState<Draft>(() => draftOf(set));
  const update = useUpdateTargetSet(set.id);
  const bad = Object.entries(draft)
    .filter(([, d]) => d.value.trim() === '' || !Number.isFinite(Number(d.value)) || Number(d.value) < 0)
    .map(([k]) => k);

  const save = () => {
    if (bad.length || !name.trim()) return;
    const targets = Object.fromEntries(
      Object.entries(draft).map(([k, d]) => [
        k,
        {
          value: Number(d.value),
          unit: d.unit,
          ...(d.source.trim() ? { source: d.source.trim() } : {}),
          ...(d.reference ? { reference: d.reference } : {}),
        },
      ]),
    );
    update.mutate({ name: name.trim(), targets }, { onSuccess: onClose });
  };

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md">
      <DialogTitle>Edit {set.name}</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          {update.error && <Alert severity="error">{update.error.message}</Alert>}
          <TargetSetUsers set={set} />
          <TextField
            label="Name"
            value={name}
            onChange={(e) => setName(e.target.value)}
            error={!name.trim()}
            helperText={!name.trim() ? 'A name is needed' : undefined}
          />
          {Object.entries(draft).map(([key, d]) => {
            const t = set.targets[key as TargetKey];
            const wrong = bad.includes(key);
            const patch = (p: Partial<Draft[string]>) => setDraft({ ...draft, [key]: { ...d, ...p } });
            return (
              <Stack key={key} spacing={1} sx={{ pb: 1.5, borderBottom: 1, borderColor: 'divider' }}>
                <Typography sx={{ fontWeight: 500 }}>{t.label}</Typography>
                <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
                  <TextField
                    label={`${t.label}: value`}
                    value={d.value}
                    onChange={(e) => patch({ value: e.target.value })}
                    error={wrong}
                    helperText={wrong ? 'A number of 0 or more' : undefined}
                    sx={{ width: { sm: 160 } }}
                    slotProps={{ htmlInput: { inputMode: 'decimal' } }}
                  />
                  <TextField
                    select
                    label="Unit"
                    value={d.unit}
                    onChange={(e) => patch({ unit: e.target.value as TargetUnit })}
                    sx={{ width: { sm: d.unit === 'um/mm' ? 260 : 110 } }}
                  >
                    {unitChoices(t.unit).map((u) => (
                      <MenuItem key={u} value={u}>
                        {UNIT_WORDS[u]}
                      </MenuItem>
                    ))}
                  </TextField>
                  {d.reference && (
                    <TextField
                      select
                      label="Judged on"
                      value={d.reference}
                      onChange={(e) => patch({ reference: e.target.value as StraightnessReference })}
                      sx={{ minWidth: { sm: 200 } }}
                    >
                      {(['minimum-zone', 'least-squares'] as const).map((r) => (
                        <MenuItem key={r} value={r}>
                          {REFERENCE_WORDS[r]}
                        </MenuItem>
                      ))}
                    </TextField>
                  )}
                  <TextField
                    label="Where it comes from"
                    value={d.source}
                    onChange={(e) => patch({ source: e.target.value })}
                    fullWidth
                  />
                </Stack>
              </Stack>
            );
          })}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" onClick={save} disabled={update.isPending || bad.length > 0 || !name.trim()}>
          Save targets
        </Button>
      </DialogActions>
    </Dialog>
  );
}
