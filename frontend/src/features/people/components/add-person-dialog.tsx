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
import type { Role } from '../../../lib/session/user';
import { ROLE_LABELS } from '../../../lib/session/roles';
import { useAddPerson } from '../api/add-person';
import { formatDateTime } from '../../../lib/format-time';

const ROLES: Role[] = ['builder', 'technician', 'owner', 'viewer', 'admin'];

export function AddPersonDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const [name, setName] = useState('');
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('builder');
  const add = useAddPerson();

  const close = () => {
    add.reset();
    setName('');
    setEmail('');
    setRole('builder');
    onClose();
  };

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
            <TextField label="Name" value={name} onChange={(e) => setName(e.target.value)} required autoFocus />
            <TextField label="E-mail" type="email" value={email} onChange={(e) => setEmail(e.target.value)} required />
            <TextField select label="Role" value={role} onChange={(e) => setRole(e.target.value as Role)}>
              {ROLES.map((r) => (
                <MenuItem key={r} value={r}>
                  {ROLE_LABELS[r]}
                </MenuItem>
              ))}
            </TextField>
          </Stack>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>{done ? 'Done' : 'Cancel'}</Button>
        {!done && (
          <Button
            variant="contained"
            disabled={!name.trim() || !email.trim() || add.isPending}
            onClick={() => add.mutate({ name: name.trim(), email: email.trim(), role })}
          >
            Add member
          </Button>
        )}
      </DialogActions>
    </Dialog>
  );
}
