import { Alert, Button, Dialog, DialogActions, DialogContent, DialogContentText, DialogTitle } from '@mui/material';
import { useDeleteEvidence } from '../api/delete-evidence';
import type { Evidence } from '../types';

/** Asks before deleting; a refusal (for example a check that is now approved) is shown here. */
export function DeleteEvidenceDialog({ item, onClose }: { item: Evidence | null; onClose: () => void }) {
  const remove = useDeleteEvidence();
  const close = () => {
    remove.reset();
    onClose();
  };
  return (
    <Dialog open={!!item} onClose={close} aria-labelledby="delete-evidence-title">
      <DialogTitle id="delete-evidence-title">Delete {item?.fileName}?</DialogTitle>
      <DialogContent>
        <DialogContentText>
          It is removed from {item?.subject.label} for everyone in the workshop. The history keeps a line saying who
          deleted it.
        </DialogContentText>
        {remove.error && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {remove.error.message}
          </Alert>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Keep it</Button>
        <Button
          color="error"
          variant="contained"
          disabled={remove.isPending}
          onClick={() => item && remove.mutate(item.id, { onSuccess: close })}
        >
          Delete
        </Button>
      </DialogActions>
    </Dialog>
  );
}
