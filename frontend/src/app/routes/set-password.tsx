import { useNavigate, useSearchParams } from 'react-router-dom';
import { useQueryClient } from '@tanstack/react-query';
import { authKeys } from '../../lib/session/get-me';
import { Box, Paper, Typography } from '@mui/material';
import { SetPasswordForm } from '../../features/auth/components/set-password-form';
import { paths } from '../../config/paths';

export default function SetPasswordRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  // Choosing the password signs the person in: ask who is signed in again, then open the app.
  const done = async () => {
    await queryClient.invalidateQueries({ queryKey: authKeys.me });
    navigate(paths.home, { replace: true });
  };
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
          <SetPasswordForm token={params.get('token') ?? ''} onDone={done} />
        </Paper>
      </Box>
    </Box>
  );
}
