import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle, MenuItem, Stack } from '@mui/material';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { useAddSafetyItem } from '../api/add-safety-item';
import type { SafetySection } from '../types';

const SECTIONS: [SafetySection, string][] = [
  ['stopping', 'Stopping'],
  ['electrical', 'Electrical'],
  ['cutting', 'Cutting'],
  ['people', 'People'],
];

/** The item as typed; the button waits for five characters of it, so the form has no message of its own. */
const safetyItemSchema = z.object({
  section: z.enum(SECTIONS.map(([id]) => id)),
  text: z.string(),
});
type SafetyItemValues = z.input<typeof safetyItemSchema>;

/** Owners and admins add the workshop's own items; every machine's walk asks them. */
export function AddSafetyItemDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const form = useForm<SafetyItemValues>({
    defaultValues: { section: 'cutting', text: '' },
    resolver: zodResolver(safetyItemSchema),
  });
  // The button waits for five characters (useWatch rather than watch: the compiler can keep it).
  const typed = useWatch({ control: form.control, name: 'text' });
  const add = useAddSafetyItem();
  const close = () => {
    add.reset();
    // The section chosen stays for the next item; the text goes.
    form.reset({ section: form.getValues('section'), text: '' });
    onClose();
  };
  const submit = form.handleSubmit(({ section, text }) =>
    add.mutate({ section, text: text.trim() }, { onSuccess: close }),
  );
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="sm">
      <DialogTitle>Add a workshop item</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          {add.error && <Alert severity="error">{(add.error as Error).message}</Alert>}
          <FormTextField form={form} name="section" select label="Section">
            {SECTIONS.map(([id, label]) => (
              <MenuItem key={id} value={id}>
                {label}
              </MenuItem>
            ))}
          </FormTextField>
          <FormTextField
            form={form}
            name="text"
            label="What is checked"
            multiline
            minRows={2}
            autoFocus
            helperText="Asked on the safety walk of every machine in the workshop"
          />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" disabled={typed.trim().length < 5 || add.isPending} onClick={submit}>
          Add item
        </Button>
      </DialogActions>
    </Dialog>
  );
}
