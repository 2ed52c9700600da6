import { useState } from 'react';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogContentText, DialogTitle } from '@mui/material';
import DeleteOutline from '@mui/icons-material/DeleteOutlineOutlined';
import { useDeleteFrameRecord, type FrameRecordKind } from '../api/delete-frame-record';

/** "Delete" with a confirmation, for a record entered by mistake. */
export function DeleteRecordButton({
  machineId,
  kind,
  id,
  what,
  onDeleted,
}: {
  machineId: string;
  kind: FrameRecordKind;
  id: string;
  what: string;
  onDeleted?: () => void;
}) {
  const [open, setOpen] = useState(false);
  const del = useDeleteFrameRecord(machineId, kind);
  const close = () => {
    del.reset();
    setOpen(false);
  };
  return (
    <>
      <Button size="small" color="error" startIcon={<DeleteOutline />} onClick={() => setOpen(true)}>
        Delete
      </Button>
      <Dialog open={open} onClose={close} maxWidth="xs" fullWidth>
        <DialogTitle>Delete {what}?</DialogTitle>
        <DialogContent>
          {del.error && (
            <Alert severity="error" sx={{ mb: 1.5 }}>
              {(del.error as Error).message}
            </Alert>
          )}
          <DialogContentText>
            Only for a record entered by mistake: it is removed from the machine file and the deletion is kept in the
            history.
          </DialogContentText>
        </DialogContent>
        <DialogActions>
          <Button onClick={close}>Keep it</Button>
          <Button
            color="error"
            variant="contained"
            disabled={del.isPending}
            onClick={() =>
              del.mutate(id, {
                onSuccess: () => {
                  close();
                  onDeleted?.();
                },
              })
            }
          >
            Delete
          </Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
