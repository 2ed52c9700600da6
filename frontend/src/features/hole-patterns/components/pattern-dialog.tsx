import { UnitFamilySelect } from '../../../components/form/unit-select';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm, useWatch } from 'react-hook-form';
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
  Typography,
} from '@mui/material';
import { FormTextField } from '../../../components/form/form-text-field';
import { ApiError } from '../../../lib/api-client';
import { useDebounced } from '../../../lib/use-debounced';
import { usePatternPreview } from '../api/preview-hole-pattern';
import { ENTRY_LABELS, REFERENCE_LABELS, type PatternEntry, type PatternInput } from '../types';
import { emptyDraft, inputOf, type PatternDraft } from '../utils/pattern-draft';
import { EntryFields } from './entry-fields';
import { patternFormSchema } from './pattern-form-schema';
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
  const form = useForm<PatternDraft>({
    defaultValues: initial ?? emptyDraft(),
    resolver: zodResolver(patternFormSchema),
  });
  // The request as typed so far (null until complete), kept while it does not change, so the
  // drawing is asked for only once the typing settles on something new.
  const input = useWatch({ control: form.control, compute: inputOf });
  const [unit, reference] = useWatch({ control: form.control, name: ['unit', 'reference'] });
  const settled = useDebounced(input, 250);
  const preview = usePatternPreview(settled);
  const problems =
    preview.error instanceof ApiError ? preview.error.details : preview.error ? [preview.error.message] : [];
  const saveProblems = error instanceof ApiError && error.details.length ? error.details : error ? [error.message] : [];
  const save = form.handleSubmit((values) => {
    const complete = inputOf(values);
    if (complete) onSave(complete);
  });
  // On a phone the form and its drawing get the whole screen rather than a cramped box.
  const phone = useMediaQuery(useTheme().breakpoints.down('sm'));

  return (
    <Dialog open onClose={onClose} fullWidth fullScreen={phone} maxWidth="md" aria-labelledby="pattern-dialog-title">
      <DialogTitle id="pattern-dialog-title">{title}</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          <FormTextField form={form} name="name" label="Name" placeholder="Y1 motor bracket" required />
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
            <FormTextField form={form} name="reference" select label="Reference (datum)" sx={{ minWidth: 200 }}>
              {Object.entries(REFERENCE_LABELS).map(([k, v]) => (
                <MenuItem key={k} value={k}>
                  {v}
                </MenuItem>
              ))}
            </FormTextField>
            <Controller
              name="unit"
              control={form.control}
              render={({ field }) => (
                <UnitFamilySelect family="length" value={field.value} onChange={field.onChange} label="Length unit" />
              )}
            />
            <FormTextField
              form={form}
              name="width"
              label={`Outline width (${unit})`}
              slotProps={{ htmlInput: { inputMode: 'decimal' } }}
            />
            <FormTextField
              form={form}
              name="height"
              label={`Outline height (${unit})`}
              slotProps={{ htmlInput: { inputMode: 'decimal' } }}
            />
          </Stack>
          <Typography variant="body2" color="text.secondary">
            x and y run from the outline’s lower-left corner: x to the right, y upwards.
          </Typography>
          <Controller
            name="entry"
            control={form.control}
            render={({ field }) => (
              <Tabs
                value={field.value}
                onChange={(_, v: PatternEntry) => field.onChange(v)}
                aria-label="How the holes are entered"
                variant="scrollable"
                allowScrollButtonsMobile
              >
                {(Object.keys(ENTRY_LABELS) as PatternEntry[]).map((k) => (
                  <Tab key={k} value={k} label={ENTRY_LABELS[k]} />
                ))}
              </Tabs>
            )}
          />
          <EntryFields form={form} />
          <FormTextField form={form} name="notes" label="Notes" multiline minRows={1} />
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
                reference={reference}
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
        <Button variant="contained" disabled={!input || saving} onClick={save}>
          {saving ? 'Saving…' : 'Save pattern'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
