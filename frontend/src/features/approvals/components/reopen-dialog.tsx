import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle, Stack, Typography } from '@mui/material';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { useReopenMachine } from '../api/reopen-machine';
import { dateOnly } from '../format';
import type { Approval } from '../types';

const MIN_REASON = 10;

const shortReason = (length: number) =>
  `Say what is to be changed and why, in at least ${MIN_REASON} characters (${length} so far)`;

const reopenFormSchema = z.object({
  reason: z.string().superRefine((reason, ctx) => {
    const length = reason.trim().length;
    if (length < MIN_REASON) ctx.addIssue({ code: 'custom', message: shortReason(length) });
  }),
});

type ReopenFormValues = z.input<typeof reopenFormSchema>;

/** The owner takes back the approval to change the machine: a written reason, kept in the history and mailed. */
export function ReopenDialog({
  machineId,
  machineName,
  approval,
  onClose,
}: {
  machineId: string;
  machineName: string;
  approval: Approval;
  onClose: () => void;
}) {
  // A short reason shows as a problem once the field has been left, and is counted as it is typed.
  const form = useForm<ReopenFormValues>({
    defaultValues: { reason: '' },
    resolver: zodResolver(reopenFormSchema),
    mode: 'onTouched',
  });
  const reopen = useReopenMachine(machineId);
  const length = useWatch({ control: form.control, name: 'reason' }).trim().length;
  const short = length < MIN_REASON;
  const close = () => {
    if (reopen.isPending) return;
    reopen.reset();
    onClose();
  };
  const send = form.handleSubmit(({ reason }) => {
    if (reopen.isPending) return;
    reopen.mutate({ reason: reason.trim() }, { onSuccess: onClose });
  });
  return (
    <Dialog open onClose={close} fullWidth maxWidth="sm" aria-labelledby="reopen-title">
      <DialogTitle id="reopen-title">Reopen {machineName} for changes</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          <Typography>
            The approval signed by {approval.approvedBy} on {dateOnly(approval.approvedAt)} will no longer stand: the
            machine is not ready to cut until its changed checks are recorded and it is approved again.
          </Typography>
          <Typography variant="body2" color="text.secondary">
            The reason is kept in the machine’s history and e-mailed to the people who work on it. The signed
            certificate stays as it was, and its public check will show the approval as reopened.
          </Typography>
          {reopen.error && <Alert severity="error">{reopen.error.message}</Alert>}
          <FormTextField
            form={form}
            name="reason"
            label="Reason for reopening"
            multiline
            minRows={3}
            required
            autoFocus
            disabled={reopen.isPending}
            helperText={short ? shortReason(length) : `${length} characters`}
          />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close} disabled={reopen.isPending}>
          Cancel
        </Button>
        <Button variant="contained" color="warning" disabled={short || reopen.isPending} onClick={send}>
          {reopen.isPending ? 'Reopening…' : 'Reopen for changes'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
