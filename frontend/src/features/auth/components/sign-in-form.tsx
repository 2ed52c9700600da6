import { useState, type FormEvent } from 'react';
import { Alert, Box, Button, Link, Stack, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { LightTextField } from '../../../components/form/light-text-field';
import { useLogin } from '../api/login';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const login = useLogin();

  const submit = (e: FormEvent) => {
    e.preventDefault();
    login.mutate({ email: email.trim(), password }, { onSuccess: onSignedIn });
  };

  return (
    <Box component="form" onSubmit={submit} noValidate>
      <Stack spacing={2}>
        <Typography variant="h2" component="h1">
          Sign in
        </Typography>
        {login.error && (
          <Alert severity="error" role="alert">
            {login.error.message}
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
