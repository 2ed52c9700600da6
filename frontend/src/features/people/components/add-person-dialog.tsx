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
import { Controller, useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import type { Role } from '../../../lib/session/user';
import { ROLE_LABELS } from '../../../lib/session/roles';
import { useAddPerson } from '../api/add-person';
import { formatDateTime } from '../../../lib/format-time';

const ROLES: Role[] = ['builder', 'technician', 'owner', 'viewer', 'admin'];

/**
 * The new member as typed. The button waits for a name and an address, and the server checks the
 * address: the form has no message of its own to show.
 */
const addPersonSchema = z.object({ name: z.string(), email: z.string(), role: z.enum(ROLES) });
type AddPersonValues = z.input<typeof addPersonSchema>;
const emptyPerson: AddPersonValues = { name: '', email: '', role: 'builder' };

export function AddPersonDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const form = useForm<AddPersonValues>({ defaultValues: emptyPerson, resolver: zodResolver(addPersonSchema) });
  // The button waits for a name and an address (useWatch rather than watch: the compiler can keep it).
  const [name, email] = useWatch({ control: form.control, name: ['name', 'email'] });
  const add = useAddPerson();

  const close = () => {
    add.reset();
    form.reset(emptyPerson);
    onClose();
  };
  const submit = form.handleSubmit((v) => add.mutate({ name: v.name.trim(), email: v.email.trim(), role: v.role }));

  const done = add.data;
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="xs">
      <DialogTitle>Add a member</DialogTitle>
      <DialogContent>
        {done ? (
          <Stack spacing={2} sx={{ pt: 1 }}>
            <Alert severity="success">
              {done.person.name} is a member as {ROLE_LABELS[done.person.role].toLowerCase()}.
            </Alert>
            {done.invitationSent ? (
              <Typography>
                We have e-mailed {done.person.email} a link to choose their password. It works once, until{' '}
                {formatDateTime(done.invitationExpiresAt)}.
              </Typography>
            ) : (
              <Alert severity="warning">
                The sign-in mail to {done.person.email} could not be sent. The link is only ever sent to them: check the
                mail settings, then use “Send sign-in link” on their row.
              </Alert>
            )}
          </Stack>
        ) : (
          <Stack spacing={2} sx={{ pt: 1 }}>
            {add.error && <Alert severity="error">{add.error.message}</Alert>}
            <FormTextField form={form} name="name" label="Name" required autoFocus />
            <FormTextField form={form} name="email" label="E-mail" type="email" required />
            <Controller
              name="role"
              control={form.control}
              render={({ field }) => (
                <TextField
                  select
                  label="Role"
                  value={field.value}
                  onChange={(e) => field.onChange(e.target.value as Role)}
                >
                  {ROLES.map((r) => (
                    <MenuItem key={r} value={r}>
                      {ROLE_LABELS[r]}
                    </MenuItem>
                  ))}
                </TextField>
              )}
            />
          </Stack>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>{done ? 'Done' : 'Cancel'}</Button>
        {!done && (
          <Button variant="contained" disabled={!name.trim() || !email.trim() || add.isPending} onClick={submit}>
            Add member
          </Button>
        )}
      </DialogActions>
    </Dialog>
  );
}
