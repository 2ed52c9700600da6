import { Alert, Button, Dialog, DialogActions, DialogContent, DialogContentText, DialogTitle } from '@mui/material';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { useOnline } from '../../../components/offline/use-online';
import { useAbandonBoltDown } from '../api/abandon-bolt-down';
import type { BoltDown } from '../types';

const MIN_REASON = 3;

const abandonFormSchema = z.object({
  reason: z
    .string()
    .refine((s) => s.trim().length >= MIN_REASON, { message: `Say why, in at least ${MIN_REASON} characters` }),
});

type AbandonFormValues = z.input<typeof abandonFormSchema>;

/** Asks why before a bolt-down is given up; the reason is kept with it and in the history. */
export function AbandonBoltDownDialog({ bd, open, onClose }: { bd: BoltDown; open: boolean; onClose: () => void }) {
  // A short reason shows as a problem once the field has been left or the form sent.
  const form = useForm<AbandonFormValues>({
    defaultValues: { reason: '' },
    resolver: zodResolver(abandonFormSchema),
    mode: 'onTouched',
  });
  const abandon = useAbandonBoltDown(bd);
  const online = useOnline();

  const submit = form.handleSubmit(({ reason }) => {
    if (abandon.isPending) return;
    abandon.mutate(reason.trim(), { onSuccess: onClose });
  });

  return (
    <Dialog
      open={open}
      onClose={onClose}
      fullWidth
      maxWidth="sm"
      slotProps={{ paper: { component: 'form', onSubmit: submit, noValidate: true } as object }}
    >
      <DialogTitle>Abandon this bolt-down?</DialogTitle>
      <DialogContent>
        <DialogContentText sx={{ mb: 2 }}>
          {bd.fixedCount} of {bd.holeCount} holes are fixed. No more holes can be fixed in it afterwards; what was
          recorded stays in the history, and a new bolt-down of rail {bd.rail.label} can begin.
        </DialogContentText>
        <FormTextField
          form={form}
          name="reason"
          autoFocus
          fullWidth
          multiline
          minRows={2}
          label="Why is it abandoned?"
          helperText="Kept with the bolt-down, e.g. “rail lifted to clean a burr off the reference face”"
          slotProps={{ htmlInput: { maxLength: 1000 } }}
        />
        {!online && (
          <Alert severity="warning" sx={{ mt: 2 }}>
            Abandoning needs the connection; it is not kept on this device.
          </Alert>
        )}
        {abandon.error && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {abandon.error.message}
          </Alert>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Keep working</Button>
        <Button type="submit" color="warning" variant="contained" disabled={abandon.isPending || !online}>
          {abandon.isPending ? 'Abandoning…' : 'Abandon bolt-down'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
