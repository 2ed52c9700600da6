import { Alert, AlertTitle, Button } from '@mui/material';
import { useOfflineQueue } from '../../../lib/use-offline-queue';

/** While readings wait on this device: how many, and that they will be sent on their own. */
export function OfflineBanner({ pathPrefix }: { pathPrefix?: string }) {
  const { pending, refused, reachable, retryNow, dismissRefused } = useOfflineQueue(pathPrefix);
  return (
    <>
      {pending.length > 0 && (
        <Alert
          severity="warning"
          role="alert"
          sx={{ mb: 2 }}
          action={
            <Button color="inherit" size="small" onClick={retryNow} sx={{ whiteSpace: 'nowrap' }}>
              Send now
            </Button>
          }
        >
          <AlertTitle>
            {reachable ? 'Sending' : 'Offline'} — {pending.length} {pending.length === 1 ? 'reading' : 'readings'} waiting
          </AlertTitle>
          They are kept on this device and sent in order as soon as the connection is back. Keep working; do not clear the browser's data.
        </Alert>
      )}
      {refused.map((w) => (
        <Alert key={w.id} severity="error" sx={{ mb: 2 }} onClose={() => dismissRefused(w.id)}>
          <AlertTitle>The server refused a reading sent later</AlertTitle>
          {w.label ?? w.path}: {w.message}
        </Alert>
      ))}
    </>
  );
}
