import { useState } from 'react';
import {
  Alert,
  Box,
  Button,
  Chip,
  MenuItem,
  Paper,
  Select,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
} from '@mui/material';
import PersonAddOutlined from '@mui/icons-material/PersonAddOutlined';
import type { Role } from '../../../lib/session/user';
import { ROLE_LABELS } from '../../../lib/session/roles';
import { useMe } from '../../../lib/session/get-me';
import { usePeople } from '../api/get-people';
import { useUpdatePerson } from '../api/update-person';
import { useResendInvitation } from '../api/resend-invitation';
import { useResetPassword } from '../api/reset-password';
import { ResetPasswordDialog } from './reset-password-dialog';
import type { Person } from '../types';
import { AddPersonDialog } from './add-person-dialog';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { ResponsiveTable } from '../../../components/table/responsive-table';

const ROLES = Object.keys(ROLE_LABELS) as Role[];

export function PeoplePanel() {
  const people = usePeople();
  const me = useMe();
  const update = useUpdatePerson();
  const resend = useResendInvitation();
  const reset = useResetPassword();
  const [adding, setAdding] = useState(false);
  const [resetting, setResetting] = useState<Person | null>(null);

  if (people.isPending) return <LoadingState label="Loading members…" />;
  if (people.isError) return <ErrorState error={people.error} onRetry={() => people.refetch()} />;

  return (
    <>
      <Box sx={{ display: 'flex', justifyContent: 'flex-end', mb: 2 }}>
        <Button variant="contained" startIcon={<PersonAddOutlined />} onClick={() => setAdding(true)}>
          Add member
        </Button>
      </Box>
      {resend.data && (
        <Alert
          severity={resend.data.invitationSent ? 'success' : 'warning'}
          sx={{ mb: 2 }}
          onClose={() => resend.reset()}
        >
          {resend.data.invitationSent
            ? 'A new sign-in link is on its way to them.'
            : 'The mail could not be sent. Check the mail settings and try again.'}
        </Alert>
      )}
      {reset.data && (
        <Alert severity={reset.data.resetSent ? 'success' : 'warning'} sx={{ mb: 2 }} onClose={() => reset.reset()}>
          {reset.data.resetSent
            ? 'The password was reset: they are signed out everywhere and a link to choose a new one is on its way to their own e-mail.'
            : 'The password was reset and they are signed out, but the mail could not be sent. Check the mail settings and reset again.'}
        </Alert>
      )}
      {reset.error && (
        <Alert severity="error" sx={{ mb: 2 }} onClose={() => reset.reset()}>
          {reset.error.message}
        </Alert>
      )}
      {resend.error && (
        <Alert severity="error" sx={{ mb: 2 }} onClose={() => resend.reset()}>
          {resend.error.message}
        </Alert>
      )}
      {update.error && (
        <Alert severity="error" sx={{ mb: 2 }} onClose={() => update.reset()}>
          {update.error.message}
        </Alert>
      )}
      <ResponsiveTable component={Paper}>
        <Table aria-label="Members">
          <TableHead>
            <TableRow>
              <TableCell>Name</TableCell>
              <TableCell>E-mail</TableCell>
              <TableCell>Role</TableCell>
              <TableCell>Status</TableCell>
              <TableCell align="right">Access</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {people.data.map((p) => (
              <TableRow key={p.id} sx={{ opacity: p.active ? 1 : 0.6 }}>
                <TableCell>
                  {p.name}
                  {p.id === me.data?.id ? ' (you)' : ''}
                </TableCell>
                <TableCell>{p.email}</TableCell>
                <TableCell>
                  <Select
                    size="small"
                    value={p.role}
                    inputProps={{ 'aria-label': `Role of ${p.name}` }}
                    onChange={(e) => update.mutate({ id: p.id, role: e.target.value as Role })}
                  >
                    {ROLES.map((r) => (
                      <MenuItem key={r} value={r}>
                        {ROLE_LABELS[r]}
                      </MenuItem>
                    ))}
                  </Select>
                </TableCell>
                <TableCell>
                  <PersonStatusChip active={p.active} invited={p.invitationPending} />
                </TableCell>
                <TableCell align="right">
                  {p.active && p.invitationPending && (
                    <Button size="small" onClick={() => resend.mutate(p.id)} disabled={resend.isPending}>
                      Send sign-in link
                    </Button>
                  )}
                  {p.active && !p.invitationPending && (
                    <Button size="small" onClick={() => setResetting(p)} disabled={reset.isPending}>
                      Reset password
                    </Button>
                  )}
                  <Button
                    size="small"
                    color={p.active ? 'error' : 'primary'}
                    onClick={() => update.mutate({ id: p.id, active: !p.active })}
                  >
                    {p.active ? 'Deactivate' : 'Reactivate'}
                  </Button>
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </ResponsiveTable>
      <AddPersonDialog open={adding} onClose={() => setAdding(false)} />
      <ResetPasswordDialog
        person={resetting}
        onCancel={() => setResetting(null)}
        onConfirm={(p) => {
          setResetting(null);
          reset.mutate(p.id);
        }}
      />
    </>
  );
}

/** Invited people have not chosen a password yet, so they have never signed in: they are not "active" yet. */
function PersonStatusChip({ active, invited }: { active: boolean; invited: boolean }) {
  if (!active) return <Chip size="small" label="Deactivated" variant="outlined" />;
  if (invited) return <Chip size="small" label="Invited, not signed in yet" color="info" variant="outlined" />;
  return <Chip size="small" label="Active" color="success" variant="outlined" />;
}
