import { Alert, Box, Button, Stack, TextField, Typography } from '@mui/material';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { LoadingState } from '../../../components/states/loading-state';
import { usePasswordLink, useSetPassword } from '../api/password-link';
import { formatDateTime } from '../../../lib/format-time';

const MIN = 12;

const setPasswordSchema = z.object({ password: z.string(), repeat: z.string() }).superRefine((v, ctx) => {
  if (v.password.length < MIN)
    ctx.addIssue({ code: 'custom', path: ['password'], message: `At least ${MIN} characters` });
  if (v.repeat !== v.password) ctx.addIssue({ code: 'custom', path: ['repeat'], message: 'The two entries differ' });
});
type SetPasswordValues = z.input<typeof setPasswordSchema>;

/** The page a person reaches from a mailed link: choose a password, and be signed in with it. */
export function SetPasswordForm({ token, onDone }: { token: string; onDone: (email: string) => void }) {
  const link = usePasswordLink(token);
  const set = useSetPassword();
  // Checked as it is typed; a change of the password checks the repeat again.
  const form = useForm<SetPasswordValues>({
    mode: 'onChange',
    defaultValues: { password: '', repeat: '' },
    resolver: zodResolver(setPasswordSchema),
  });
  if (!token) return <Alert severity="error">This page needs the link from your sign-in e-mail.</Alert>;
  if (link.isPending) return <LoadingState label="Checking the link…" />;
  if (link.isError)
    return (
      <Alert severity="error" role="alert">
        {link.error.message}
      </Alert>
    );
  const submit = form.handleSubmit(({ password }) =>
    set.mutate({ token, password }, { onSuccess: (r) => onDone(r.email) }),
  );
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
        {/* A field left empty is not flagged: its problem shows once something is typed in it. The error
            is read first on every render, so that the field hears of one found while it was still empty. */}
        <Controller
          name="password"
          control={form.control}
          rules={{ deps: ['repeat'] }}
          render={({ field, fieldState: { error } }) => (
            <TextField
              label="New password"
              type="password"
              autoComplete="new-password"
              name={field.name}
              value={field.value}
              onChange={field.onChange}
              onBlur={field.onBlur}
              inputRef={field.ref}
              helperText={`At least ${MIN} characters`}
              error={!!error && field.value.length > 0}
              required
              fullWidth
              autoFocus
            />
          )}
        />
        <Controller
          name="repeat"
          control={form.control}
          render={({ field, fieldState: { error } }) => {
            const mismatch = error && field.value.length > 0 ? error : undefined;
            return (
              <TextField
                label="Repeat the password"
                type="password"
                autoComplete="new-password"
                name={field.name}
                value={field.value}
                onChange={field.onChange}
                onBlur={field.onBlur}
                inputRef={field.ref}
                error={!!mismatch}
                helperText={mismatch ? mismatch.message : ' '}
                required
                fullWidth
              />
            );
          }}
        />
        <Button type="submit" variant="contained" size="large" disabled={!form.formState.isValid || set.isPending}>
          {set.isPending ? 'Saving…' : 'Set password and sign in'}
        </Button>
      </Stack>
    </Box>
  );
}
