import { useParams } from 'react-router-dom';
import { Box, Container, Typography } from '@mui/material';
import { VerificationPage } from '../../features/verification/components/verification-page';

/** Open to anyone holding a certificate: no sign-in, no navigation into the workshop's records. */
export default function VerifyRoute() {
  const { token = '' } = useParams();
  return (
    <Box sx={{ minHeight: '100vh', bgcolor: 'background.default' }}>
      <Box component="header" sx={{ bgcolor: 'primary.dark', color: '#fff', py: 2 }}>
        <Container maxWidth="md" sx={{ display: 'flex', alignItems: 'center', gap: 1.5 }}>
          <Box component="img" src="/railwright.svg" alt="" sx={{ width: 32, height: 32 }} />
          <Box>
            <Typography variant="h4" component="h1" sx={{ fontWeight: 700 }}>
              Certificate check
            </Typography>
            <Typography variant="body2" sx={{ opacity: 0.85 }}>
              Railwright · commissioning certificate of a gantry machine
            </Typography>
          </Box>
        </Container>
      </Box>
      <Container maxWidth="md" component="main" sx={{ py: { xs: 2, sm: 3 } }}>
        <VerificationPage token={token} />
      </Container>
    </Box>
  );
}
