import { useCallback, useDeferredValue, useMemo, useRef, useState } from 'react';
import { Alert, Box, Button, Grid, InputAdornment, MenuItem, Paper, Snackbar, Stack, TextField, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import FileUploadOutlined from '@mui/icons-material/FileUploadOutlined';
import { IndicatorPanel } from '../../../components/indicator-input/indicator-panel';
import { useIndicatorInput } from '../../../components/indicator-input/use-indicator-input';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { useBoltTorques } from '../api/get-bolt-torques';
import { sweepsPath, useRecordSweep } from '../api/record-sweep';
import { useWaitingEntries } from '../../../lib/offline/use-waiting-entries';
import { useStraightnessPreview } from '../api/preview-straightness';
import { useDebounced } from '../../../lib/use-debounced';
import { newDraft, useSweepDraft, type StationDraft, type SweepDraft } from '../hooks/use-sweep-draft';
import { FACE_LABELS, type Rail, type Sweep, type SweepFace, type TargetValue } from '../types';
import { readyStations, stationsAtHoles, stationsByStep } from '../utils/stations';
import { CsvImportDialog } from './csv-import-dialog';
import { StationReadings } from './station-readings';
import { SweepDetailsFields } from './sweep-details-fields';
import { SweepPreview } from './sweep-preview';

const num = (s: string) => (s.trim() === '' ? undefined : Number(s.replace(',', '.')));

/** Entering a sweep at the machine: stations from the holes or a fixed step, a reading each, a live fit. */
export function SweepEntry({ rail, target, takenBy, onSaved }: { rail: Rail; target: TargetValue | null; takenBy: string; onSaved: (s: Sweep) => void }) {
  const [draft, setDraft] = useSweepDraft(rail.id, () => newDraft(stationsAtHoles(rail.holes, rail.lengthUnit), { takenBy, boltSize: rail.typicalBoltSize ?? '', lengthUnit: rail.lengthUnit }));
  const [stepMm, setStepMm] = useState('100');
  const [source, setSource] = useState<'holes' | 'step'>('holes');
  const [csvOpen, setCsvOpen] = useState(false);
  const saveRef = useRef<HTMLButtonElement>(null);
  const torques = useBoltTorques();
  const record = useRecordSweep(rail);
  const waiting = useWaitingEntries(sweepsPath(rail.id));
  const [refused, setRefused] = useState<string | null>(null);
  // Stable callbacks (setDraft keeps its identity), so memoised rows and fields skip re-rendering.
  const patch = useCallback((p: Partial<SweepDraft>) => setDraft((d) => ({ ...d, ...p })), [setDraft]);
  const setRow = useCallback(
    (i: number, p: Partial<StationDraft>) => setDraft((d) => ({ ...d, stations: d.stations.map((r, k) => (k === i ? { ...r, ...p } : r)) })),
    [setDraft],
  );
  // A dropped station can be put back (the snackbar's Undo) where it was, reading and all.
  const [dropped, setDropped] = useState<{ index: number; row: StationDraft } | null>(null);
  const dropRow = useCallback(
    (i: number) =>
      setDraft((d) => {
        const row = d.stations[i];
        if (!row) return d;
        setDropped({ index: i, row });
        return { ...d, stations: d.stations.filter((_, k) => k !== i) };
      }),
    [setDraft],
  );
  const undoDrop = () => {
    if (!dropped) return;
    setDraft((d) => ({ ...d, stations: [...d.stations.slice(0, dropped.index), dropped.row, ...d.stations.slice(dropped.index)] }));
    setDropped(null);
  };
  const focusSave = useCallback(() => saveRef.current?.focus(), []);
  // An indicator's reading goes to the station it was typed at, or else the first without a reading.
  const indicator = useIndicatorInput({
    unit: draft.unit,
    place: (text, cell) => {
      const i = cell !== null ? Number(cell) : draft.stations.findIndex((s) => s.reading.trim() === '');
      const row = draft.stations[i];
      if (!row) return null;
      setRow(i, { reading: text });
      return { cell: String(i), label: `station ${i + 1} at ${row.position} ${UNIT_LABELS[draft.lengthUnit]}`, undo: () => setRow(i, { reading: '' }) };
    },
  });

  const ready = useMemo(() => readyStations(draft.stations), [draft.stations]);
  const body = useMemo(
    () => (ready.stations.length >= 3 && ready.problems.size === 0 ? { positions: ready.stations.map((s) => s.position), readings: ready.stations.map((s) => s.reading), readingUnit: draft.unit, lengthUnit: draft.lengthUnit } : null),
    [ready, draft.unit, draft.lengthUnit],
  );
  // The fit is asked for once typing pauses; the chart draws the same settled readings, at low
  // priority (deferred), so a keystroke never waits for the chart.
  const settled = useDebounced(body);
  const preview = useStraightnessPreview(settled);
  const result = preview.data?.result ?? null;
  const chartPoints = useDeferredValue(useMemo(() => (settled ? settled.positions.map((position, k) => ({ position, reading: settled.readings[k] })) : []), [settled]));
  const chartResult = useDeferredValue(body && settled ? result : null);
  const details = useMemo(
    () => ({ instrument: draft.instrument, resolution: draft.resolution, temperatureC: draft.temperatureC, phase: draft.phase, takenBy: draft.takenBy, boltSize: draft.boltSize, torqueNm: draft.torqueNm, datum: draft.datum, notes: draft.notes }),
    [draft.instrument, draft.resolution, draft.temperatureC, draft.phase, draft.takenBy, draft.boltSize, draft.torqueNm, draft.datum, draft.notes],
  );
  // Residuals back onto the rows they belong to (rows without a reading have none).
  const residuals = useMemo(() => {
    if (!preview.data) return undefined;
    const byPosition = new Map(preview.data.body.positions.map((p, k) => [p, fromMm(preview.data!.result.leastSquares.residuals[k], draft.unit)]));
    return draft.stations.map((r) => byPosition.get(Number(r.position)) ?? null);
  }, [preview.data, draft.stations, draft.unit]);

  const hasReadings = draft.stations.some((s) => s.reading.trim() !== '');
  const layStations = (rows: SweepDraft['stations']) => {
    if (hasReadings && !window.confirm('Replace the stations? The readings typed so far will be cleared.')) return;
    patch({ stations: rows });
  };
  const save = () => {
    if (!body) return;
    const sent = draft;
    setRefused(null);
    record.send(
      {
        id: draft.id,
        readingUnit: draft.unit,
        lengthUnit: draft.lengthUnit,
        face: draft.face,
        stations: ready.stations,
        phase: draft.phase,
        instrument: draft.instrument.trim() || undefined,
        resolution: num(draft.resolution),
        temperatureC: num(draft.temperatureC),
        takenBy: draft.takenBy.trim() || undefined,
        boltSize: draft.boltSize || undefined,
        torqueNm: num(draft.torqueNm),
        datum: draft.datum.trim() || undefined,
        notes: draft.notes.trim() || undefined,
      },
      {
        onSuccess: onSaved,
        // Refused by the server: the readings come back to the form with the reason, nothing lost.
        onError: (err) => {
          setDraft(sent);
          setRefused(err.message);
        },
      },
    );
    // The entry is kept by the device's queue from here on (sent now, or when the connection
    // returns): keep the set-up (instrument, datum, bolts) for the next sweep; clear the readings.
    setDraft(({ id: _saved, stations, ...setUp }) => newDraft(stations.map((s) => ({ ...s, reading: '' })), setUp));
  };

  return (
    <Paper ref={indicator.containerRef} component="section" aria-label="New sweep" sx={{ p: { xs: 1.5, sm: 2.5 } }}>
      <Typography variant="h3" component="h2" gutterBottom>
        New sweep
      </Typography>
      <Alert severity="info" icon={false} sx={{ mb: 2 }}>
        <strong>Sign:</strong> + means the rail is further from the reference, − nearer to it.{' '}
        {draft.face === 'side'
          ? 'Side face: zero the indicator anywhere, only the shape counts (a side sweep gives no height).'
          : 'Top face: read both partner rails against one common datum (a level bar or straightedge spanning them) and name it the same on both, or no height difference can be worked out.'}
      </Alert>
      <Stack direction="row" spacing={1.5} useFlexGap sx={{ alignItems: 'center', flexWrap: 'wrap', mb: 2 }}>
        <UnitFamilySelect family="reading" value={draft.unit} onChange={(unit) => patch({ unit })} label="Reading unit" />
        <UnitFamilySelect family="length" value={draft.lengthUnit} onChange={(lengthUnit) => patch({ lengthUnit })} label="Position unit" />
        <TextField select label="Face read" value={draft.face} onChange={(e) => patch({ face: e.target.value as SweepFace })} sx={{ minWidth: 220 }} slotProps={{ htmlInput: { 'data-testid': 'sweep-face' } }}>
          {(['side', 'top'] as const).map((f) => (
            <MenuItem key={f} value={f}>
              {FACE_LABELS[f]}
            </MenuItem>
          ))}
        </TextField>
        <ToggleButtonGroup exclusive size="small" value={source} onChange={(_, v) => v && setSource(v)} aria-label="Where the stations are">
          <ToggleButton value="holes">At the holes</ToggleButton>
          <ToggleButton value="step">Fixed step</ToggleButton>
        </ToggleButtonGroup>
        {source === 'step' && (
          <TextField label="Step" value={stepMm} onChange={(e) => setStepMm(e.target.value)} sx={{ width: 120 }} slotProps={{ htmlInput: { inputMode: 'decimal' }, input: { endAdornment: <InputAdornment position="end">{UNIT_LABELS[draft.lengthUnit]}</InputAdornment> } }} />
        )}
        <Button variant="outlined" onClick={() => layStations(source === 'holes' ? stationsAtHoles(rail.holes, draft.lengthUnit) : stationsByStep(fromMm(rail.lengthMm, draft.lengthUnit), Number(stepMm)))}>
          {source === 'holes' ? `Lay ${rail.holes.length} stations at the holes` : 'Lay stations'}
        </Button>
        <Button startIcon={<FileUploadOutlined />} onClick={() => setCsvOpen(true)}>
          Import CSV
        </Button>
      </Stack>
      <IndicatorPanel indicator={indicator} nextLabel="the next station without a reading" />
      <Grid container spacing={2.5}>
        {/* On a narrow screen the chart comes first, so it stays in view above the readings being typed. */}
        <Grid size={{ xs: 12, md: 6 }} sx={{ order: { xs: 2, md: 1 } }}>
          <StationReadings rows={draft.stations} unit={draft.unit} lengthUnit={draft.lengthUnit} problems={ready.problems} residuals={residuals} onRowChange={setRow} onDrop={dropRow} onLastEnter={focusSave} />
        </Grid>
        <Grid size={{ xs: 12, md: 6 }} sx={{ order: { xs: 1, md: 2 } }}>
          <SweepPreview points={chartPoints} unit={settled?.readingUnit ?? draft.unit} lengthUnit={settled?.lengthUnit ?? draft.lengthUnit} result={chartResult} target={target} label="Live straightness chart" pending={preview.isFetching} />
          {preview.error && <Alert severity="error" sx={{ mt: 1 }}>{preview.error.message}</Alert>}
        </Grid>
        <Grid size={12} sx={{ order: 3 }}>
          <SweepDetailsFields value={details} unitLabel={UNIT_LABELS[draft.unit]} torques={torques.data} onChange={patch} />
        </Grid>
      </Grid>
      <Box sx={{ display: 'flex', gap: 2, alignItems: 'center', flexWrap: 'wrap', mt: 2.5 }}>
        <Button ref={saveRef} variant="contained" size="large" onClick={save} disabled={!body}>
          Save sweep
        </Button>
        <Typography color="text.secondary">
          {ready.stations.length} reading{ready.stations.length === 1 ? '' : 's'}
          {ready.blank ? ` · ${ready.blank} station${ready.blank === 1 ? '' : 's'} without a reading will be left out` : ''}
          {ready.problems.size ? ` · ${ready.problems.size} to fix` : ''}
        </Typography>
        {refused && <Alert severity="error" sx={{ flex: '1 1 100%' }}>{refused} — nothing was lost; fix it and save again.</Alert>}
        {waiting.map((w) => (
          <Alert key={w.key} severity="info" sx={{ flex: '1 1 100%' }} data-testid="sweep-waiting">
            Waiting to send: {w.label}. It is kept on this device and recorded once when the connection returns.
          </Alert>
        ))}
      </Box>
      <Snackbar
        open={!!dropped}
        autoHideDuration={10_000}
        onClose={(_, why) => why !== 'clickaway' && setDropped(null)}
        message={dropped ? `Removed station ${dropped.index + 1} at ${dropped.row.position || '?'} ${UNIT_LABELS[draft.lengthUnit]}${dropped.row.reading.trim() ? ` (reading ${dropped.row.reading})` : ''}` : ''}
        action={
          <Button color="inherit" size="small" onClick={undoDrop} aria-label={dropped ? `Undo removing station ${dropped.index + 1}` : 'Undo'}>
            Undo
          </Button>
        }
      />
      <CsvImportDialog
        open={csvOpen}
        unit={draft.unit}
        onClose={() => setCsvOpen(false)}
        onImport={(stations) => patch({ stations: stations.map((s) => ({ position: String(s.position), reading: String(s.reading) })) })}
      />
    </Paper>
  );
}
