import { UnitFamilySelect } from '../../../components/form/unit-select';
import { useState } from 'react';
import {
  Alert,
  Box,
  Button,
  Dialog,
  useMediaQuery,
  useTheme,
  DialogActions,
  DialogContent,
  DialogTitle,
  MenuItem,
  Stack,
  Tab,
  Tabs,
  TextField,
  Typography,
} from '@mui/material';
import { ApiError } from '../../../lib/api-client';
import { useDebounced } from '../../../lib/use-debounced';
import { usePatternPreview } from '../api/preview-hole-pattern';
import { ENTRY_LABELS, REFERENCE_LABELS, type PatternEntry, type PatternInput, type PatternReference } from '../types';
import { emptyDraft, inputOf, type PatternDraft } from '../utils/pattern-draft';
import { EntryFields } from './entry-fields';
import { PatternDrawing } from './pattern-drawing';

interface Props {
  title: string;
  initial?: PatternDraft;
  saving: boolean;
  error: Error | null;
  onSave: (input: PatternInput) => void;
  onClose: () => void;
}

/** Enter or change a pattern, with a live drawing of the holes the server works out. */
export function PatternDialog({ title, initial, saving, error, onSave, onClose }: Props) {
  const [draft, setDraft] = useState<PatternDraft>(initial ?? emptyDraft());
  const input = inputOf(draft);
  const settled = useDebounced(input, 250);
  const preview = usePatternPreview(settled);
  const problems =
    preview.error instanceof ApiError ? preview.error.details : preview.error ? [preview.error.message] : [];
  const saveProblems = error instanceof ApiError && error.details.length ? error.details : error ? [error.message] : [];
  const set = (change: (d: PatternDraft) => PatternDraft) => setDraft(change);
  // On a phone the form and its drawing get the whole screen rather than a cramped box.
  const phone = useMediaQuery(useTheme().breakpoints.down('sm'));

  return (
    <Dialog open onClose={onClose} fullWidth fullScreen={phone} maxWidth="md" aria-labelledby="pattern-dialog-title">
      <DialogTitle id="pattern-dialog-title">{title}</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          <TextField
            label="Name"
            placeholder="Y1 motor bracket"
            required
            value={draft.name}
            onChange={(e) => set((d) => ({ ...d, name: e.target.value }))}
          />
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
            <TextField
              select
              label="Reference (datum)"
              value={draft.reference}
              onChange={(e) => set((d) => ({ ...d, reference: e.target.value as PatternReference }))}
              sx={{ minWidth: 200 }}
            >
              {Object.entries(REFERENCE_LABELS).map(([k, v]) => (
                <MenuItem key={k} value={k}>
                  {v}
                </MenuItem>
              ))}
            </TextField>
            <UnitFamilySelect
              family="length"
              value={draft.unit}
              onChange={(unit) => set((d) => ({ ...d, unit }))}
              label="Length unit"
            />
            <TextField
              label={`Outline width (${draft.unit})`}
              value={draft.width}
              slotProps={{ htmlInput: { inputMode: 'decimal' } }}
              onChange={(e) => set((d) => ({ ...d, width: e.target.value }))}
            />
            <TextField
              label={`Outline height (${draft.unit})`}
              value={draft.height}
              slotProps={{ htmlInput: { inputMode: 'decimal' } }}
              onChange={(e) => set((d) => ({ ...d, height: e.target.value }))}
            />
          </Stack>
          <Typography variant="body2" color="text.secondary">
            x and y run from the outline’s lower-left corner: x to the right, y upwards.
          </Typography>
          <Tabs
            value={draft.entry}
            onChange={(_, v: PatternEntry) => set((d) => ({ ...d, entry: v }))}
            aria-label="How the holes are entered"
            variant="scrollable"
            allowScrollButtonsMobile
          >
            {(Object.keys(ENTRY_LABELS) as PatternEntry[]).map((k) => (
              <Tab key={k} value={k} label={ENTRY_LABELS[k]} />
            ))}
          </Tabs>
          <EntryFields draft={draft} set={set} />
          <TextField
            label="Notes"
            multiline
            minRows={1}
            value={draft.notes}
            onChange={(e) => set((d) => ({ ...d, notes: e.target.value }))}
          />
          <Box sx={{ border: 1, borderColor: 'divider', borderRadius: 1, p: 1 }}>
            <Typography variant="subtitle2" component="h3" sx={{ mb: 1 }}>
              Preview {preview.data ? `· ${preview.data.holes.length} holes` : ''}{' '}
              {preview.isFetching ? '· updating…' : ''}
            </Typography>
            {!input && <Typography color="text.secondary">Give a name and every number to see the holes.</Typography>}
            {problems.length > 0 && (
              <Alert severity="warning" sx={{ mb: 1 }}>
                {problems.map((p) => (
                  <div key={p}>{p}</div>
                ))}
              </Alert>
            )}
            {preview.data && (
              <PatternDrawing
                widthMm={preview.data.widthMm}
                heightMm={preview.data.heightMm}
                holes={preview.data.holes}
                reference={draft.reference}
                label="Preview of the pattern"
                maxHeight={260}
              />
            )}
          </Box>
          {saveProblems.length > 0 && (
            <Alert severity="error">
              {saveProblems.map((p) => (
                <div key={p}>{p}</div>
              ))}
            </Alert>
          )}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" disabled={!input || saving} onClick={() => input && onSave(input)}>
          {saving ? 'Saving…' : 'Save pattern'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
