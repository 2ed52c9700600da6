import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { Box, Paper, Typography } from '@mui/material';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { useMe } from '../../lib/session/get-me';
import { paths } from '../../config/paths';

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const next = params.get('next')?.startsWith('/') ? params.get('next')! : paths.home;
  // Signed in already: on to the page asked for. Not while who is signed in is being asked again
  // (a session kept on the device may have ended): the form stays put, with whatever is typed in it.
  if (me.data && !me.isFetching) return <Navigate to={next} replace />;
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
      <Box sx={{ width: '100%', maxWidth: 420 }}>
        <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, mb: 2, color: '#fff' }}>
          <Box component="img" src="/railwright.svg" alt="" sx={{ width: 40, height: 40 }} />
          <Box>
            <Typography variant="h2" component="p" sx={{ fontWeight: 700 }}>
              Railwright
            </Typography>
            <Typography sx={{ opacity: 0.85 }}>Commissioning and calibration log for gantry machines</Typography>
          </Box>
        </Box>
        <Paper sx={{ p: { xs: 3, sm: 4 } }}>
          <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
        </Paper>
      </Box>
    </Box>
  );
}
