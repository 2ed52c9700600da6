import { useState } from 'react';
import { Alert, Box, Button, Typography } from '@mui/material';
import { errorText } from '../utils/format';

/** Delete with a second click to confirm; a locked record says why it stays. */
export function DeleteRecordButton({
  what,
  locked,
  onDelete,
  pending,
  error,
}: {
  what: string;
  locked: boolean;
  onDelete: () => void;
  pending: boolean;
  error: unknown;
}) {
  const [asking, setAsking] = useState(false);
  if (locked) {
    return (
      <Typography variant="body2" color="text.secondary">
        This {what} is part of an approved commissioning record and can no longer be deleted.
      </Typography>
    );
  }
  return (
    <Box sx={{ display: 'flex', gap: 1, alignItems: 'center', flexWrap: 'wrap' }}>
      {asking ? (
        <>
          <Typography variant="body2">Delete this {what}? It stays in the history as deleted.</Typography>
          <Button size="small" color="error" variant="contained" onClick={onDelete} disabled={pending}>
            Delete
          </Button>
          <Button size="small" onClick={() => setAsking(false)}>
            Keep it
          </Button>
        </>
      ) : (
        <Button size="small" color="error" onClick={() => setAsking(true)}>
          Delete this {what}
        </Button>
      )}
      {!!error && <Alert severity="error">{errorText(error)}</Alert>}
    </Box>
  );
}
