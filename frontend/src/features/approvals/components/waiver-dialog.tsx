import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle, Stack, Typography } from '@mui/material';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { useWaiveCheck } from '../api/waive-check';
import { resultText, targetText } from '../format';
import { KIND_LABELS, STATUS_LABELS, type BoardCheck } from '../types';

const MIN_REASON = 10;

const waiverFormSchema = z.object({
  reason: z
    .string()
    .refine((s) => s.trim().length >= MIN_REASON, { message: `Say why, in at least ${MIN_REASON} characters` }),
});

type WaiverFormValues = z.input<typeof waiverFormSchema>;

const emptyWaiverForm: WaiverFormValues = { reason: '' };

/** An owner lets one check pass with a written reason, kept on the record and printed. */
export function WaiverDialog({
  machineId,
  check,
  onClose,
}: {
  machineId: string;
  check: BoardCheck | null;
  onClose: () => void;
}) {
  const form = useForm<WaiverFormValues>({ defaultValues: emptyWaiverForm, resolver: zodResolver(waiverFormSchema) });
  const waive = useWaiveCheck(machineId);
  const close = () => {
    form.reset(emptyWaiverForm);
    waive.reset();
    onClose();
  };
  const length = useWatch({ control: form.control, name: 'reason' }).trim().length;
  // The button stays off until the reason is long enough; the hint counts meanwhile.
  const short = length < MIN_REASON;
  const submit = form.handleSubmit(
    ({ reason }) => check && waive.mutate({ checkKey: check.key, reason: reason.trim() }, { onSuccess: close }),
  );
  return (
    <Dialog open={!!check} onClose={close} fullWidth maxWidth="sm">
      <DialogTitle>Waive a check</DialogTitle>
      {check && (
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            <Typography>
              <strong>{KIND_LABELS[check.kind]}</strong> of {check.subject}: {STATUS_LABELS[check.status].toLowerCase()}
              {check.result ? `, ${resultText(check.result)} against ${targetText(check.kind, check.target)}` : ''}.
            </Typography>
            <Typography variant="body2" color="text.secondary">
              The waiver belongs to this result: if the check is recorded again, it needs a new waiver. The reason is
              printed on the certificate.
            </Typography>
            {waive.error && <Alert severity="error">{waive.error.message}</Alert>}
            <FormTextField
              form={form}
              name="reason"
              label="Reason"
              multiline
              minRows={3}
              required
              autoFocus
              helperText={short ? `Say why, in at least ${MIN_REASON} characters` : `${length} characters`}
            />
          </Stack>
        </DialogContent>
      )}
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" disabled={short || waive.isPending} onClick={submit}>
          Waive with this reason
        </Button>
      </DialogActions>
    </Dialog>
  );
}
