import { useCallback, useRef, useState } from 'react';
import { useShallow } from 'zustand/react/shallow';
import {
  Alert,
  Box,
  Button,
  Grid,
  InputAdornment,
  MenuItem,
  Paper,
  Snackbar,
  Stack,
  TextField,
  ToggleButton,
  ToggleButtonGroup,
  Typography,
} from '@mui/material';
import FileUploadOutlined from '@mui/icons-material/FileUploadOutlined';
import { IndicatorPanel } from '../../../components/indicator-input/indicator-panel';
import { useIndicatorInput } from '../../../components/indicator-input/use-indicator-input';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { useBoltTorques } from '../api/get-bolt-torques';
import { sweepsPath, useRecordSweep } from '../api/record-sweep';
import { useWaitingEntries } from '../../../lib/offline/use-waiting-entries';
import { newDraft, useDraft, useSweepDraft, type StationDraft, type SweepDraft } from '../hooks/use-sweep-draft';
import { FACE_LABELS, type Rail, type Sweep, type SweepFace, type TargetValue } from '../types';
import { readyStations, stationsAtHoles, stationsByStep } from '../utils/stations';
import { CsvImportDialog } from './csv-import-dialog';
import { SweepDetailsFields } from './sweep-details-fields';
import { SweepSaveBar } from './sweep-save-bar';
import { SweepWorkArea } from './sweep-work-area';

const num = (s: string) => (s.trim() === '' ? undefined : Number(s.replace(',', '.')));

/** Entering a sweep at the machine: stations from the holes or a fixed step, a reading each, a live fit. */
export function SweepEntry({
  rail,
  target,
  takenBy,
  onSaved,
}: {
  rail: Rail;
  target: TargetValue | null;
  takenBy: string;
  onSaved: (s: Sweep) => void;
}) {
  const store = useSweepDraft(rail.id, () =>
    newDraft(stationsAtHoles(rail.holes, rail.lengthUnit), {
      takenBy,
      boltSize: rail.typicalBoltSize ?? '',
      lengthUnit: rail.lengthUnit,
    }),
  );
  // Only the form's own settings are read here; the stations are read by the rows, the count and
  // the fit (each subscribes to what it shows), so a keystroke in a reading re-renders that field only.
  const unit = useDraft(store, (d) => d.unit);
  const lengthUnit = useDraft(store, (d) => d.lengthUnit);
  const face = useDraft(store, (d) => d.face);
  const details = useDraft(
    store,
    useShallow((d: SweepDraft) => ({
      instrument: d.instrument,
      resolution: d.resolution,
      temperatureC: d.temperatureC,
      phase: d.phase,
      takenBy: d.takenBy,
      boltSize: d.boltSize,
      torqueNm: d.torqueNm,
      datum: d.datum,
      notes: d.notes,
    })),
  );
  const [stepMm, setStepMm] = useState('100');
  const [source, setSource] = useState<'holes' | 'step'>('holes');
  const [csvOpen, setCsvOpen] = useState(false);
  const saveRef = useRef<HTMLButtonElement>(null);
  const torques = useBoltTorques();
  const record = useRecordSweep(rail);
  const waiting = useWaitingEntries(sweepsPath(rail.id));
  const [refused, setRefused] = useState<string | null>(null);
  // Stable callbacks, so memoised rows and fields skip re-rendering.
  const patch = useCallback((p: Partial<SweepDraft>) => store.setState(p), [store]);
  const setRow = useCallback(
    (i: number, p: Partial<StationDraft>) =>
      store.setState((d) => ({ stations: d.stations.map((r, k) => (k === i ? { ...r, ...p } : r)) })),
    [store],
  );
  // A dropped station can be put back (the snackbar's Undo) where it was, reading and all.
  const [dropped, setDropped] = useState<{ index: number; row: StationDraft } | null>(null);
  const dropRow = useCallback(
    (i: number) => {
      const row = store.getState().stations[i];
      if (!row) return;
      setDropped({ index: i, row });
      store.setState((d) => ({ stations: d.stations.filter((_, k) => k !== i) }));
    },
    [store],
  );
  const undoDrop = () => {
    if (!dropped) return;
    store.setState((d) => ({
      stations: [...d.stations.slice(0, dropped.index), dropped.row, ...d.stations.slice(dropped.index)],
    }));
    setDropped(null);
  };
  const focusSave = useCallback(() => saveRef.current?.focus(), []);
  // An indicator's reading goes to the station it was typed at, or else the first without a reading.
  const indicator = useIndicatorInput({
    unit,
    place: (text, cell) => {
      const stations = store.getState().stations;
      const i = cell !== null ? Number(cell) : stations.findIndex((s) => s.reading.trim() === '');
      const row = stations[i];
      if (!row) return null;
      setRow(i, { reading: text });
      return {
        cell: String(i),
        label: `station ${i + 1} at ${row.position} ${UNIT_LABELS[lengthUnit]}`,
        undo: () => setRow(i, { reading: '' }),
      };
    },
  });

  const layStations = (rows: SweepDraft['stations']) => {
    const hasReadings = store.getState().stations.some((s) => s.reading.trim() !== '');
    if (hasReadings && !window.confirm('Replace the stations? The readings typed so far will be cleared.')) return;
    patch({ stations: rows });
  };
  const save = () => {
    const draft = store.getState();
    const ready = readyStations(draft.stations);
    if (ready.stations.length < 3 || ready.problems.size > 0) return;
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
          store.setState(draft, true);
          setRefused(err.message);
        },
      },
    );
    // The entry is kept by the device's queue from here on (sent now, or when the connection
    // returns): keep the set-up (instrument, datum, bolts) for the next sweep; clear the readings.
    const { id: _saved, stations, ...setUp } = draft;
    store.setState(
      newDraft(
        stations.map((s) => ({ ...s, reading: '' })),
        setUp,
      ),
      true,
    );
  };

  return (
    <Paper ref={indicator.containerRef} component="section" aria-label="New sweep" sx={{ p: { xs: 1.5, sm: 2.5 } }}>
      <Typography variant="h3" component="h2" gutterBottom>
        New sweep
      </Typography>
      <Alert severity="info" icon={false} sx={{ mb: 2 }}>
        <strong>Sign:</strong> + means the rail is further from the reference, − nearer to it.{' '}
        {face === 'side'
          ? 'Side face: zero the indicator anywhere, only the shape counts (a side sweep gives no height).'
          : 'Top face: read both partner rails against one common datum (a level bar or straightedge spanning them) and name it the same on both, or no height difference can be worked out.'}
      </Alert>
      <Stack direction="row" spacing={1.5} useFlexGap sx={{ alignItems: 'center', flexWrap: 'wrap', mb: 2 }}>
        <UnitFamilySelect family="reading" value={unit} onChange={(u) => patch({ unit: u })} label="Reading unit" />
        <UnitFamilySelect
          family="length"
          value={lengthUnit}
          onChange={(u) => patch({ lengthUnit: u })}
          label="Position unit"
        />
        <TextField
          select
          label="Face read"
          value={face}
          onChange={(e) => patch({ face: e.target.value as SweepFace })}
          sx={{ minWidth: 220 }}
          slotProps={{ htmlInput: { 'data-testid': 'sweep-face' } }}
        >
          {(['side', 'top'] as const).map((f) => (
            <MenuItem key={f} value={f}>
              {FACE_LABELS[f]}
            </MenuItem>
          ))}
        </TextField>
        <ToggleButtonGroup
          exclusive
          size="small"
          value={source}
          onChange={(_, v) => v && setSource(v)}
          aria-label="Where the stations are"
        >
          <ToggleButton value="holes">At the holes</ToggleButton>
          <ToggleButton value="step">Fixed step</ToggleButton>
        </ToggleButtonGroup>
        {source === 'step' && (
          <TextField
            label="Step"
            value={stepMm}
            onChange={(e) => setStepMm(e.target.value)}
            sx={{ width: 120 }}
            slotProps={{
              htmlInput: { inputMode: 'decimal' },
              input: { endAdornment: <InputAdornment position="end">{UNIT_LABELS[lengthUnit]}</InputAdornment> },
            }}
          />
        )}
        <Button
          variant="outlined"
          onClick={() =>
            layStations(
              source === 'holes'
                ? stationsAtHoles(rail.holes, lengthUnit)
                : stationsByStep(fromMm(rail.lengthMm, lengthUnit), Number(stepMm)),
            )
          }
        >
          {source === 'holes' ? `Lay ${rail.holes.length} stations at the holes` : 'Lay stations'}
        </Button>
        <Button startIcon={<FileUploadOutlined />} onClick={() => setCsvOpen(true)}>
          Import CSV
        </Button>
      </Stack>
      <IndicatorPanel indicator={indicator} nextLabel="the next station without a reading" />
      <Grid container spacing={2.5}>
        <SweepWorkArea
          store={store}
          unit={unit}
          lengthUnit={lengthUnit}
          target={target}
          onRowChange={setRow}
          onDrop={dropRow}
          onLastEnter={focusSave}
        />
        <Grid size={12} sx={{ order: 3 }}>
          <SweepDetailsFields value={details} unitLabel={UNIT_LABELS[unit]} torques={torques.data} onChange={patch} />
        </Grid>
      </Grid>
      <Box sx={{ display: 'flex', gap: 2, alignItems: 'center', flexWrap: 'wrap', mt: 2.5 }}>
        <SweepSaveBar store={store} saveRef={saveRef} onSave={save} />
        {refused && (
          <Alert severity="error" sx={{ flex: '1 1 100%' }}>
            {refused} — nothing was lost; fix it and save again.
          </Alert>
        )}
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
        message={
          dropped
            ? `Removed station ${dropped.index + 1} at ${dropped.row.position || '?'} ${UNIT_LABELS[lengthUnit]}${dropped.row.reading.trim() ? ` (reading ${dropped.row.reading})` : ''}`
            : ''
        }
        action={
          <Button
            color="inherit"
            size="small"
            onClick={undoDrop}
            aria-label={dropped ? `Undo removing station ${dropped.index + 1}` : 'Undo'}
          >
            Undo
          </Button>
        }
      />
      <CsvImportDialog
        open={csvOpen}
        unit={unit}
        onClose={() => setCsvOpen(false)}
        onImport={(stations) =>
          patch({ stations: stations.map((s) => ({ position: String(s.position), reading: String(s.reading) })) })
        }
      />
    </Paper>
  );
}
