import { useState, type FormEvent } from 'react';
import { Alert, Box, Button, Stack, TextField, Typography } from '@mui/material';
import { useRequestPasswordLink } from '../api/password-link';

const looksLikeEmail = (v: string) => /^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(v);

/** Asks for a link to choose a new password; the answer never says whether the address has an account. */
export function ForgotPasswordForm({
  initialEmail,
  signInLink,
}: {
  initialEmail: string;
  signInLink: React.ReactNode;
}) {
  const [email, setEmail] = useState(initialEmail);
  const [touched, setTouched] = useState(false);
  const request = useRequestPasswordLink();
  const bad = !looksLikeEmail(email.trim());
  const submit = (e: FormEvent) => {
    e.preventDefault();
    setTouched(true);
    if (!bad) request.mutate({ email: email.trim() });
  };
  if (request.isSuccess) {
    return (
      <Stack spacing={2}>
        <Typography variant="h2" component="h1">
          Check your e-mail
        </Typography>
        <Alert severity="success" role="status">
          {request.data.message}
        </Alert>
        <Typography color="text.secondary">
          Your current password keeps working until you use the link. Nothing arrived? Look in the spam folder, or ask
          an admin of your workshop.
        </Typography>
        {signInLink}
      </Stack>
    );
  }
  return (
    <Box component="form" onSubmit={submit} noValidate>
      <Stack spacing={2}>
        <Typography variant="h2" component="h1">
          Forgot your password?
        </Typography>
        <Typography color="text.secondary">
          Give the e-mail address you sign in with. If it has an account, a link to choose a new password is sent to it.
        </Typography>
        {request.error && (
          <Alert severity="error" role="alert">
            {request.error.message}
          </Alert>
        )}
        <TextField
          label="E-mail"
          type="email"
          autoComplete="username"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          onBlur={() => setTouched(true)}
          error={touched && bad}
          helperText={touched && bad ? 'Enter an e-mail address, such as name@example.com' : ' '}
          required
          fullWidth
          autoFocus
        />
        <Button type="submit" variant="contained" size="large" disabled={request.isPending}>
          {request.isPending ? 'Sending…' : 'Send me a link'}
        </Button>
        {signInLink}
      </Stack>
    </Box>
  );
}
