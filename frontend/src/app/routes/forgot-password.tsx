import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { Box, Link, Paper, Typography } from '@mui/material';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';
import { paths } from '../../config/paths';

export default function ForgotPasswordRoute() {
  const [params] = useSearchParams();
  return (
    <Box
      sx={{
        minHeight: '100vh',
        display: 'grid',
        placeItems: 'center',
        p: 2,
        background: 'linear-gradient(160deg, #0f2f2c 0%, #1d4f4a 55%, #3f7a73 100%)',
      }}
    >
      <Box sx={{ width: '100%', maxWidth: 440 }}>
        <Typography variant="h2" component="p" sx={{ fontWeight: 700, color: '#fff', mb: 2 }}>
          Railwright
        </Typography>
        <Paper sx={{ p: { xs: 3, sm: 4 } }}>
          <ForgotPasswordForm
            initialEmail={params.get('email') ?? ''}
            signInLink={
              <Link component={RouterLink} to={paths.signIn} sx={{ alignSelf: 'center', py: 1.25 }}>
                Back to sign in
              </Link>
            }
          />
        </Paper>
      </Box>
    </Box>
  );
}
