import { Alert, AlertTitle } from '@mui/material';
import { KIND_LABELS, STATUS_LABELS, type BlockingCheck } from '../types';

/** Why a request (or an approval) was refused: the checks still in the way. */
export function BlockingAlert({
  message,
  blocking,
  onClose,
}: {
  message: string;
  blocking: BlockingCheck[];
  onClose: () => void;
}) {
  return (
    <Alert severity="error" onClose={onClose} role="alert">
      <AlertTitle>Approval cannot be requested yet</AlertTitle>
      {blocking.length ? (
        <>
          These checks must be within target, or waived by an owner with a reason:
          <ul style={{ margin: '4px 0 0', paddingLeft: 20 }}>
            {blocking.map((b) => (
              <li key={b.key}>
                {KIND_LABELS[b.kind]} — {b.subject}: {STATUS_LABELS[b.status].toLowerCase()}
              </li>
            ))}
          </ul>
        </>
      ) : (
        message
      )}
    </Alert>
  );
}
