import { useMemo, useState } from 'react';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  IconButton,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Tooltip,
  Typography,
} from '@mui/material';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { FormTextField } from '../../../components/form/form-text-field';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { parseSweepCsv } from '../utils/parse-sweep-csv';
import {
  badRowsMessage,
  csvImportFormSchema,
  emptyCsvImportForm,
  goodRows,
  MIN_IMPORTED_STATIONS,
  TOO_FEW_STATIONS_MESSAGE,
  toImportedStations,
  type CsvImportFormValues,
} from './csv-import-form-schema';

const MAX_FILE_BYTES = 1_000_000;

/**
 * Readings pasted or uploaded as "position, reading" lines. Every bad line is marked, and the
 * import stays refused until each one is fixed in the text or dropped.
 */
export function CsvImportDialog({
  open,
  unit,
  onClose,
  onImport,
}: {
  open: boolean;
  unit: LengthUnit;
  onClose: () => void;
  onImport: (stations: { position: number; reading: number }[]) => void;
}) {
  const form = useForm<CsvImportFormValues>({
    defaultValues: emptyCsvImportForm,
    resolver: zodResolver(csvImportFormSchema),
  });
  const [fileError, setFileError] = useState<string | null>(null);
  // The preview and its problems follow the text as it is typed, before any import is tried.
  const text = useWatch({ control: form.control, name: 'text' });
  const parsed = useMemo(() => parseSweepCsv(text), [text]);
  const bad = parsed.rows.filter((r) => r.problem);
  const good = goodRows(parsed.rows);
  const setText = (next: string) => form.setValue('text', next);

  const dropLine = (line: number) =>
    setText(
      text
        .replace(/\r\n?/g, '\n')
        .split('\n')
        .filter((_, i) => i + 1 !== line)
        .join('\n'),
    );
  const dropBad = () => {
    const lines = new Set(bad.map((r) => r.line));
    setText(
      text
        .replace(/\r\n?/g, '\n')
        .split('\n')
        .filter((_, i) => !lines.has(i + 1))
        .join('\n'),
    );
  };
  const readFile = async (file: File | undefined) => {
    setFileError(null);
    if (!file) return;
    if (file.size > MAX_FILE_BYTES)
      return setFileError('That file is larger than 1 MB; a sweep file is a few lines of text.');
    setText(await file.text());
  };
  const close = () => {
    form.reset(emptyCsvImportForm);
    setFileError(null);
    onClose();
  };
  const submit = form.handleSubmit((values) => {
    onImport(toImportedStations(values));
    close();
  });
  const tooFew = good.length < MIN_IMPORTED_STATIONS;

  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="md">
      <DialogTitle>Import readings from CSV</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          <Typography color="text.secondary">
            One station per line: position in mm, then the reading in {UNIT_LABELS[unit]} (the unit chosen for the
            sweep). Commas, semicolons, tabs or spaces between them; a header line is skipped.
          </Typography>
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5} sx={{ alignItems: { sm: 'flex-start' } }}>
            <FormTextField
              form={form}
              name="text"
              label="Paste readings"
              multiline
              minRows={6}
              maxRows={14}
              fullWidth
              placeholder={'position_mm,reading\n0,0\n200,0.5\n400,1.5'}
              slotProps={{ htmlInput: { spellCheck: false, style: { fontFamily: 'monospace' } } }}
            />
            <Button component="label" variant="outlined" startIcon={<UploadFileOutlined />} sx={{ flexShrink: 0 }}>
              Upload a file
              <input
                hidden
                type="file"
                accept=".csv,.txt,text/csv,text/plain"
                aria-label="CSV file"
                onChange={(e) => readFile(e.target.files?.[0])}
              />
            </Button>
          </Stack>
          {fileError && <Alert severity="error">{fileError}</Alert>}
          {parsed.header && (
            <Typography variant="body2" color="text.secondary">
              Header skipped: “{parsed.header}”
            </Typography>
          )}
          {parsed.rows.length > 0 && (
            <TableContainer sx={{ maxHeight: 320, border: 1, borderColor: 'divider', borderRadius: 1 }}>
              <Table size="small" stickyHeader aria-label="Import preview">
                <TableHead>
                  <TableRow>
                    <TableCell>Line</TableCell>
                    <TableCell>Position (mm)</TableCell>
                    <TableCell>Reading ({UNIT_LABELS[unit]})</TableCell>
                    <TableCell>Check</TableCell>
                    <TableCell />
                  </TableRow>
                </TableHead>
                <TableBody>
                  {parsed.rows.map((r) => (
                    <TableRow
                      key={r.line}
                      sx={r.problem ? { bgcolor: '#fbe3df' } : undefined}
                      data-bad={r.problem ? 'true' : undefined}
                    >
                      <TableCell>{r.line}</TableCell>
                      <TableCell>{r.position ?? '—'}</TableCell>
                      <TableCell>{r.reading ?? '—'}</TableCell>
                      <TableCell
                        sx={{ color: r.problem ? 'error.main' : 'success.main', fontWeight: r.problem ? 600 : 400 }}
                      >
                        {r.problem ?? 'OK'}
                      </TableCell>
                      <TableCell>
                        <Tooltip title="Drop this line">
                          <IconButton size="small" aria-label={`Drop line ${r.line}`} onClick={() => dropLine(r.line)}>
                            <DeleteOutline fontSize="small" />
                          </IconButton>
                        </Tooltip>
                      </TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            </TableContainer>
          )}
          {bad.length > 0 && (
            <Alert
              severity="error"
              action={
                <Button color="inherit" size="small" onClick={dropBad}>
                  Drop bad rows
                </Button>
              }
            >
              {badRowsMessage(bad.length)}
            </Alert>
          )}
          {!bad.length && parsed.rows.length > 0 && tooFew && (
            <Alert severity="warning">{TOO_FEW_STATIONS_MESSAGE}</Alert>
          )}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button variant="contained" disabled={bad.length > 0 || tooFew} onClick={submit}>
          Import {good.length} station{good.length === 1 ? '' : 's'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
