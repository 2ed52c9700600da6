import { useRef, useState, type FormEvent } from 'react';
import { Alert, Box, Button, Link, Stack, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { LightTextField } from '../../../components/form/light-text-field';
import { useLogin } from '../api/login';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const login = useLogin();
  // A double click submits twice before the button shows it is busy: one attempt is sent, so a
  // wrong password counts once towards the sign-in limit.
  const sending = useRef(false);
  // The last refusal stays on screen while the next attempt is sent, so the button does not move
  // under a second click.
  const [problem, setProblem] = useState<string | null>(null);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (sending.current) return;
    sending.current = true;
    login.mutate(
      { email: email.trim(), password },
      {
        onSuccess: onSignedIn,
        onError: (err) => setProblem(err.message),
        onSettled: () => {
          sending.current = false;
        },
      },
    );
  };

  return (
    <Box component="form" onSubmit={submit} noValidate>
      <Stack spacing={2}>
        <Typography variant="h2" component="h1">
          Sign in
        </Typography>
        {problem && (
          <Alert severity="error" role="alert">
            {problem}
          </Alert>
        )}
        <LightTextField
          label="E-mail"
          type="email"
          autoComplete="username"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          required
          autoFocus
        />
        <LightTextField
          label="Password"
          type="password"
          autoComplete="current-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          required
        />
        <Button type="submit" variant="contained" size="large" disabled={login.isPending || !email || !password}>
          {login.isPending ? 'Signing in…' : 'Sign in'}
        </Button>
        <Link
          component={RouterLink}
          to={email ? `${paths.forgotPassword}?email=${encodeURIComponent(email.trim())}` : paths.forgotPassword}
          sx={{ alignSelf: 'center', py: 1.25 }}
        >
          Forgot your password?
        </Link>
      </Stack>
    </Box>
  );
}
