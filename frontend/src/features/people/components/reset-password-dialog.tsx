import { Button, Dialog, DialogActions, DialogContent, DialogContentText, DialogTitle } from '@mui/material';
import type { Person } from '../types';

/** Says what a reset does before it is done: nobody but the person ever sees the new link. */
export function ResetPasswordDialog({
  person,
  onCancel,
  onConfirm,
}: {
  person: Person | null;
  onCancel: () => void;
  onConfirm: (p: Person) => void;
}) {
  return (
    <Dialog open={!!person} onClose={onCancel} fullWidth maxWidth="xs">
      <DialogTitle>Reset the password of {person?.name}?</DialogTitle>
      <DialogContent>
        <DialogContentText>
          Their current password stops working and they are signed out everywhere. A link to choose a new password goes
          to {person?.email} only; you will not see it. The reset is kept in the workshop's activity.
        </DialogContentText>
      </DialogContent>
      <DialogActions>
        <Button onClick={onCancel}>Cancel</Button>
        <Button color="error" variant="contained" onClick={() => person && onConfirm(person)}>
          Reset password
        </Button>
      </DialogActions>
    </Dialog>
  );
}
