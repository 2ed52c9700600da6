import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Paper as Sheet,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import EditOutlined from '@mui/icons-material/EditOutlined';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import { useDeleteHolePattern } from '../api/delete-hole-pattern';
import { patternTemplateUrl } from '../api/template-links';
import { useUpdateHolePattern } from '../api/update-hole-pattern';
import { REFERENCE_LABELS, type HolePattern } from '../types';
import { draftOf } from '../utils/pattern-draft';
import { usePaper } from '../utils/use-paper';
import { PatternDialog } from './pattern-dialog';
import { PatternDrawing } from './pattern-drawing';
import { PrintAdvice } from './print-advice';
import { TemplateLinks } from './template-links';

const mm = (v: number) => Number(v.toFixed(3));

/** One pattern: its drawing, every hole in mm, the template links, and edit/delete for recorders. */
export function HolePatternDetails({
  pattern: p,
  canEdit,
  afterDelete,
}: {
  pattern: HolePattern;
  canEdit: boolean;
  afterDelete: string;
}) {
  const [paper, setPaper] = usePaper();
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const update = useUpdateHolePattern(p.id);
  const remove = useDeleteHolePattern(p.id);
  const navigate = useNavigate();
  return (
    <Stack spacing={2.5}>
      <PrintAdvice paper={paper} onPaper={setPaper} />
      <Stack direction="row" spacing={1} useFlexGap sx={{ flexWrap: 'wrap' }}>
        <TemplateLinks
          what={p.name}
          paper={paper}
          pdfUrl={(x) => patternTemplateUrl(p.id, 'pdf', x)}
          svgUrl={patternTemplateUrl(p.id, 'svg')}
        />
        {canEdit && (
          <>
            <Button startIcon={<EditOutlined />} onClick={() => setEditing(true)}>
              Edit pattern
            </Button>
            <Button color="error" startIcon={<DeleteOutline />} onClick={() => setDeleting(true)}>
              Delete
            </Button>
          </>
        )}
      </Stack>
      <Sheet variant="outlined" sx={{ p: 2 }}>
        <Typography variant="body2" color="text.secondary" gutterBottom>
          Outline {p.widthMm} × {p.heightMm} mm · reference {REFERENCE_LABELS[p.reference].toLowerCase()} · entered in{' '}
          {p.lengthUnit === 'in' ? 'inches' : 'mm'}
          {p.notes ? ` · ${p.notes}` : ''}
        </Typography>
        <PatternDrawing
          widthMm={p.widthMm}
          heightMm={p.heightMm}
          holes={p.holes}
          reference={p.reference}
          label={`Drawing of ${p.name}`}
        />
      </Sheet>
      <TableContainer component={Sheet} variant="outlined">
        <Table size="small" aria-label="Holes">
          <TableHead>
            <TableRow>
              <TableCell>Hole</TableCell>
              <TableCell align="right">x (mm)</TableCell>
              <TableCell align="right">y (mm)</TableCell>
              <TableCell align="right">Ø (mm)</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {p.holes.map((h, i) => (
              <TableRow key={i}>
                <TableCell>{i + 1}</TableCell>
                <TableCell align="right">{mm(h.xMm)}</TableCell>
                <TableCell align="right">{mm(h.yMm)}</TableCell>
                <TableCell align="right">{mm(h.diameterMm)}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
      {editing && (
        <PatternDialog
          title={`Edit ${p.name}`}
          initial={draftOf(p)}
          saving={update.isPending}
          error={update.error}
          onClose={() => setEditing(false)}
          onSave={(input) => update.mutate(input, { onSuccess: () => setEditing(false) })}
        />
      )}
      <Dialog open={deleting} onClose={() => setDeleting(false)}>
        <DialogTitle>Delete {p.name}?</DialogTitle>
        <DialogContent>
          {remove.error && <Alert severity="error">{remove.error.message}</Alert>}
          <Typography>The pattern is removed from the machine file; templates already printed stay valid.</Typography>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setDeleting(false)}>Keep it</Button>
          <Button
            color="error"
            variant="contained"
            disabled={remove.isPending}
            onClick={() => remove.mutate(undefined, { onSuccess: () => navigate(afterDelete) })}
          >
            Delete pattern
          </Button>
        </DialogActions>
      </Dialog>
    </Stack>
  );
}
