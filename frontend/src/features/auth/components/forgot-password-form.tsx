import { Alert, Box, Button, Stack, Typography } from '@mui/material';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { useRequestPasswordLink } from '../api/password-link';

const looksLikeEmail = (v: string) => /^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(v);

const forgotPasswordSchema = z.object({
  email: z.string().refine((v) => looksLikeEmail(v.trim()), 'Enter an e-mail address, such as name@example.com'),
});
type ForgotPasswordValues = z.input<typeof forgotPasswordSchema>;

/** Asks for a link to choose a new password; the answer never says whether the address has an account. */
export function ForgotPasswordForm({
  initialEmail,
  signInLink,
}: {
  initialEmail: string;
  signInLink: React.ReactNode;
}) {
  // The address is checked once the field is left (or the form sent), then on every change.
  const form = useForm<ForgotPasswordValues>({
    mode: 'onTouched',
    defaultValues: { email: initialEmail },
    resolver: zodResolver(forgotPasswordSchema),
  });
  const request = useRequestPasswordLink();
  const submit = form.handleSubmit(({ email }) => request.mutate({ email: email.trim() }));
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
        <FormTextField
          form={form}
          name="email"
          label="E-mail"
          type="email"
          autoComplete="username"
          helperText=" "
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
