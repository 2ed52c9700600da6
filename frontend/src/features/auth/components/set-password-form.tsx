import { useState, type FormEvent } from 'react';
import { Alert, Box, Button, Stack, TextField, Typography } from '@mui/material';
import { LoadingState } from '../../../components/states/loading-state';
import { usePasswordLink, useSetPassword } from '../api/password-link';
import { formatDateTime } from '../../../lib/format-time';

const MIN = 12;

/** The page a person reaches from a mailed link: choose a password, and be signed in with it. */
export function SetPasswordForm({ token, onDone }: { token: string; onDone: (email: string) => void }) {
  const link = usePasswordLink(token);
  const set = useSetPassword();
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  if (!token) return <Alert severity="error">This page needs the link from your sign-in e-mail.</Alert>;
  if (link.isPending) return <LoadingState label="Checking the link…" />;
  if (link.isError)
    return (
      <Alert severity="error" role="alert">
        {link.error.message}
      </Alert>
    );
  const tooShort = password.length < MIN;
  const mismatch = repeat.length > 0 && repeat !== password;
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!tooShort && !mismatch) set.mutate({ token, password }, { onSuccess: (r) => onDone(r.email) });
  };
  return (
    <Box component="form" onSubmit={submit} noValidate>
      <Stack spacing={2}>
        <Typography variant="h2" component="h1">
          Choose your password
        </Typography>
        <Typography color="text.secondary">
          {link.data.name}, {link.data.workshop} · {link.data.email}. This link works once, until{' '}
          {formatDateTime(link.data.expiresAt)}.
        </Typography>
        {set.error && (
          <Alert severity="error" role="alert">
            {set.error.message}
          </Alert>
        )}
        <TextField
          label="New password"
          type="password"
          autoComplete="new-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          helperText={`At least ${MIN} characters`}
          error={password.length > 0 && tooShort}
          required
          fullWidth
          autoFocus
        />
        <TextField
          label="Repeat the password"
          type="password"
          autoComplete="new-password"
          value={repeat}
          onChange={(e) => setRepeat(e.target.value)}
          error={mismatch}
          helperText={mismatch ? 'The two entries differ' : ' '}
          required
          fullWidth
        />
        <Button
          type="submit"
          variant="contained"
          size="large"
          disabled={tooShort || repeat !== password || set.isPending}
        >
          {set.isPending ? 'Saving…' : 'Set password and sign in'}
        </Button>
      </Stack>
    </Box>
  );
}
