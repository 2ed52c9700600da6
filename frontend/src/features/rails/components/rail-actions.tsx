import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle, Typography } from '@mui/material';
import EditOutlined from '@mui/icons-material/EditOutlined';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import { useDeleteRail } from '../api/delete-rail';
import type { Rail } from '../types';
import { EditRailDialog } from './edit-rail-dialog';

/** Edit and delete for recorders; the rail page puts other actions beside these. */
export function RailActions({ rail, others, afterDelete }: { rail: Rail; others: Rail[]; afterDelete: string }) {
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const remove = useDeleteRail(rail.id);
  const navigate = useNavigate();
  return (
    <>
      <Button startIcon={<EditOutlined />} onClick={() => setEditing(true)}>
        Edit rail
      </Button>
      <Button color="error" startIcon={<DeleteOutline />} onClick={() => setDeleting(true)}>
        Delete
      </Button>
      {editing && <EditRailDialog rail={rail} others={others} onClose={() => setEditing(false)} />}
      <Dialog open={deleting} onClose={() => setDeleting(false)}>
        <DialogTitle>Delete rail {rail.label}?</DialogTitle>
        <DialogContent>
          {remove.error && (
            <Alert severity="error" sx={{ mb: 1 }}>
              {remove.error.message}
            </Alert>
          )}
          <Typography>
            The rail and all its sweeps are removed from the machine file. Sweeps that an approval was based on cannot
            be deleted.
          </Typography>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setDeleting(false)}>Keep it</Button>
          <Button
            color="error"
            variant="contained"
            disabled={remove.isPending}
            onClick={() => remove.mutate(undefined, { onSuccess: () => navigate(afterDelete) })}
          >
            Delete rail
          </Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
