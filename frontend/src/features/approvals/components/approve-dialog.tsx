import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  List,
  ListItem,
  ListItemText,
  Stack,
  Typography,
} from '@mui/material';
import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { useApproveMachine } from '../api/approve-machine';
import { KIND_LABELS, type Readiness } from '../types';

const MIN_STATEMENT = 20;

const statementOk = (statement: string) => statement.trim().length >= MIN_STATEMENT;

const approveFormSchema = z.object({
  statement: z.string().refine(statementOk, { message: `The statement must be at least ${MIN_STATEMENT} characters` }),
  // No message for the password: signing stays off until one is typed.
  password: z.string(),
});

type ApproveFormValues = z.input<typeof approveFormSchema>;

/** The signature: read the statement (edit it if needed), read the cautions, re-enter the password. */
export function ApproveDialog({
  open,
  onClose,
  machineName,
  readiness,
}: {
  open: boolean;
  onClose: () => void;
  machineName: string;
  readiness: Readiness;
}) {
  // The statement is checked as it is edited; the password only has to be there to sign.
  const form = useForm<ApproveFormValues>({
    defaultValues: { statement: readiness.defaultStatement, password: '' },
    resolver: zodResolver(approveFormSchema),
    mode: 'onChange',
  });
  const [statement, password] = useWatch({ control: form.control, name: ['statement', 'password'] });
  const canSign = !!password && statementOk(statement);
  const approve = useApproveMachine(readiness.machineId);
  const close = () => {
    form.resetField('password');
    approve.reset();
    onClose();
  };
  const sign = form.handleSubmit((values) =>
    approve.mutate({ password: values.password, statement: values.statement.trim() }, { onSuccess: close }),
  );
  const waived = readiness.checks.filter((c) => c.status === 'waived');
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="md" scroll="paper" aria-labelledby="approve-title">
      <DialogTitle id="approve-title">Approve {machineName} as ready to cut</DialogTitle>
      <DialogContent dividers>
        <Stack spacing={2}>
          <Typography>
            {readiness.counts.total} required checks: {readiness.counts.within} within target, {readiness.counts.waived}{' '}
            waived. The approval keeps these exact results and a hash over them; the records it is based on can no
            longer be changed.
          </Typography>
          {waived.length > 0 && (
            <Box>
              <Typography variant="subtitle2">Waived checks</Typography>
              <List dense disablePadding>
                {waived.map((c) => (
                  <ListItem key={c.key} disableGutters>
                    <ListItemText
                      primary={`${KIND_LABELS[c.kind]} — ${c.subject}`}
                      secondary={`“${c.waiver?.reason}” (${c.waiver?.by})`}
                    />
                  </ListItem>
                ))}
              </List>
            </Box>
          )}
          <FormTextField
            form={form}
            name="statement"
            label="Statement you sign"
            multiline
            minRows={4}
            helperText="Printed on the certificate as written here."
          />
          <Alert severity="warning" icon={<WarningAmberOutlined />} sx={{ '& ul': { m: 0, pl: 2 } }}>
            <Typography variant="subtitle2" component="p">
              Before anyone cuts
            </Typography>
            <ul>
              {readiness.cautions.map((c) => (
                <li key={c.title}>
                  <Typography variant="body2">
                    <strong>{c.title}.</strong> {c.text}
                  </Typography>
                </li>
              ))}
            </ul>
          </Alert>
          {approve.error && <Alert severity="error">{approve.error.message}</Alert>}
          <FormTextField
            form={form}
            name="password"
            label="Your password (to sign)"
            type="password"
            autoComplete="current-password"
            onKeyDown={(e) => e.key === 'Enter' && canSign && void sign()}
          />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" disabled={!canSign || approve.isPending} onClick={sign}>
          Sign and approve
        </Button>
      </DialogActions>
    </Dialog>
  );
}
