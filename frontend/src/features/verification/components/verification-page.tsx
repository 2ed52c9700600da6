import { Alert, Button, Paper, Stack, Typography } from '@mui/material';
import DataObjectOutlined from '@mui/icons-material/DataObjectOutlined';
import KeyOutlined from '@mui/icons-material/KeyOutlined';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { ApiError } from '../../../lib/api-client';
import { signedRecordUrl } from '../api/download-signed-record';
import { signingKeyUrl } from '../api/download-signing-key';
import { useVerification } from '../api/get-verification';
import { ApprovalFacts } from './approval-facts';
import { DifferencesList } from './differences-list';
import { VerdictBanner } from './verdict-banner';

/** The public check of a certificate: the verdict, what was signed, what differs, and the files to check it offline. */
export function VerificationPage({ token }: { token: string }) {
  const q = useVerification(token);
  if (q.isPending) return <LoadingState label="Checking the signature against the record…" />;
  if (q.isError) {
    const unknown = q.error instanceof ApiError && q.error.status === 404;
    return unknown ? (
      <Alert severity="warning" role="alert">
        <Typography component="h2" sx={{ fontWeight: 700 }}>
          Unknown verification address
        </Typography>
        {q.error.message}
      </Alert>
    ) : (
      <ErrorState error={q.error} onRetry={() => q.refetch()} title="The certificate could not be checked" />
    );
  }
  const v = q.data;
  return (
    <Stack spacing={2}>
      <VerdictBanner v={v} />
      {v.differences.length > 0 && <DifferencesList differences={v.differences} more={v.moreDifferences} />}
      <ApprovalFacts v={v} />
      <Paper sx={{ p: { xs: 2, sm: 3 } }}>
        <Typography variant="h4" component="h2">
          Check it yourself
        </Typography>
        <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5 }}>
          The signed record is the exact text the owner’s signature covers, rebuilt now from the records as they are
          kept. Its {v.algorithm} signature checks with the public key below using any standard tool; the README of
          Railwright gives a one-line command.
        </Typography>
        <Stack direction={{ xs: 'column', sm: 'row' }} useFlexGap sx={{ gap: 1, mt: 1.5 }}>
          {v.status !== 'unsigned' && (
            <Button variant="outlined" startIcon={<DataObjectOutlined />} href={signedRecordUrl(token)} download>
              Signed record (JSON)
            </Button>
          )}
          <Button
            variant="outlined"
            startIcon={<KeyOutlined />}
            href={signingKeyUrl}
            download="railwright-signing-key.pem"
          >
            Public key (PEM)
          </Button>
        </Stack>
        {v.keyId && (
          <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 1.5, overflowWrap: 'anywhere' }}>
            Key id (SHA-256 of the public key): <span style={{ fontFamily: 'monospace' }}>{v.keyId}</span>
          </Typography>
        )}
        <Typography variant="caption" color="text.secondary" component="p" sx={{ overflowWrap: 'anywhere' }}>
          Record hash printed on the certificate: <span style={{ fontFamily: 'monospace' }}>{v.recordHash}</span>
        </Typography>
      </Paper>
    </Stack>
  );
}
