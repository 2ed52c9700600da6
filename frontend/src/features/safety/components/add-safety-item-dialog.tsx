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
import { useAddSafetyItem } from '../api/add-safety-item';
import type { SafetySection } from '../types';

const SECTIONS: [SafetySection, string][] = [
  ['stopping', 'Stopping'],
  ['electrical', 'Electrical'],
  ['cutting', 'Cutting'],
  ['people', 'People'],
];

/** Owners and admins add the workshop's own items; every machine's walk asks them. */
export function AddSafetyItemDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const [section, setSection] = useState<SafetySection>('cutting');
  const [text, setText] = useState('');
  const add = useAddSafetyItem();
  const close = () => {
    add.reset();
    setText('');
    onClose();
  };
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="sm">
      <DialogTitle>Add a workshop item</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          {add.error && <Alert severity="error">{(add.error as Error).message}</Alert>}
          <TextField
            select
            label="Section"
            value={section}
            onChange={(e) => setSection(e.target.value as SafetySection)}
          >
            {SECTIONS.map(([id, label]) => (
              <MenuItem key={id} value={id}>
                {label}
              </MenuItem>
            ))}
          </TextField>
          <TextField
            label="What is checked"
            value={text}
            onChange={(e) => setText(e.target.value)}
            multiline
            minRows={2}
            autoFocus
            helperText="Asked on the safety walk of every machine in the workshop"
          />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button
          variant="contained"
          disabled={text.trim().length < 5 || add.isPending}
          onClick={() => add.mutate({ section, text: text.trim() }, { onSuccess: close })}
        >
          Add item
        </Button>
      </DialogActions>
    </Dialog>
  );
}
