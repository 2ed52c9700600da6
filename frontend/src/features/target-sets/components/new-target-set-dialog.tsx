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
} from '@mui/material';
import { useCreateTargetSet } from '../api/create-target-set';
import type { TargetSet } from '../types';

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
  const [sourceId, setSourceId] = useState(from.id);
  const [name, setName] = useState(`${from.name} (copy)`);
  const [description, setDescription] = useState(from.description);
  const create = useCreateTargetSet();
  const source = sets.find((s) => s.id === sourceId) ?? from;
  const trimmed = name.trim();
  const taken = sets.some((s) => s.name.trim().toLowerCase() === trimmed.toLowerCase());
  const problem = !trimmed
    ? 'A name is needed'
    : taken
      ? 'Another target set has this name'
      : trimmed.length > 120
        ? 'At most 120 characters'
        : null;
  const save = () => {
    if (problem) return;
    create.mutate(
      { from: source, name: trimmed, description: description.trim() },
      { onSuccess: (made) => onCreated(made.id) },
    );
  };
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="new-target-set-title">
      <DialogTitle id="new-target-set-title">New target set</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          {create.error && <Alert severity="error">{create.error.message}</Alert>}
          <TextField
            select
            label="Start from"
            value={sourceId}
            onChange={(e) => setSourceId(e.target.value)}
            helperText="Every target, its unit and its source are copied; change them afterwards."
          >
            {sets.map((s) => (
              <MenuItem key={s.id} value={s.id}>
                {s.name}
              </MenuItem>
            ))}
          </TextField>
          <TextField
            label="Name"
            value={name}
            onChange={(e) => setName(e.target.value)}
            error={!!problem}
            helperText={problem ?? ' '}
            autoFocus
          />
          <TextField
            label="Description"
            value={description}
            onChange={(e) => setDescription(e.target.value)}
            multiline
            minRows={2}
          />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" onClick={save} disabled={create.isPending || !!problem}>
          {create.isPending ? 'Making…' : 'Make target set'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
