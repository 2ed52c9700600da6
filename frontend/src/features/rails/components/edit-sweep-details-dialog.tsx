import { useState, type FormEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  InputAdornment,
  MenuItem,
  TextField,
  useMediaQuery,
  useTheme,
} from '@mui/material';
import { useOnline } from '../../../components/offline/use-online';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { useBoltTorques } from '../api/get-bolt-torques';
import { sweepQueryOptions } from '../api/get-sweep';
import { useUpdateSweepDetails, type SweepDetailsPatch } from '../api/update-sweep-details';
import type { Sweep } from '../types';

const text = (v: string | number | null | undefined) => (v === null || v === undefined ? '' : String(v));
const number = (t: string): number | null | 'bad' =>
  t.trim() === ''
    ? null
    : Number.isFinite(Number(t.trim().replace(',', '.')))
      ? Number(t.trim().replace(',', '.'))
      : 'bad';

/** Corrects what was noted with a sweep (datum, notes, instrument, who, bolts); its readings stay as taken. */
export function EditSweepDetailsDialog({
  sweepId,
  title,
  onClose,
}: {
  sweepId: string;
  title: string;
  onClose: () => void;
}) {
  const sweep = useQuery(sweepQueryOptions(sweepId));
  const fullScreen = useMediaQuery(useTheme().breakpoints.down('sm'));
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" fullScreen={fullScreen} aria-labelledby="edit-sweep-title">
      <DialogTitle id="edit-sweep-title">Edit details of the {title}</DialogTitle>
      {sweep.isPending ? (
        <DialogContent>
          <LoadingState label="Loading the sweep…" />
        </DialogContent>
      ) : sweep.isError ? (
        <DialogContent>
          <ErrorState error={sweep.error} onRetry={() => sweep.refetch()} />
        </DialogContent>
      ) : (
        <DetailsForm sweep={sweep.data} onClose={onClose} />
      )}
    </Dialog>
  );
}

function DetailsForm({ sweep, onClose }: { sweep: Sweep; onClose: () => void }) {
  const [instrument, setInstrument] = useState(sweep.instrument);
  const [temperature, setTemperature] = useState(text(sweep.temperatureC));
  const [takenBy, setTakenBy] = useState(sweep.takenBy);
  const [datum, setDatum] = useState(text(sweep.datum));
  const [boltSize, setBoltSize] = useState(text(sweep.boltSize));
  const [torque, setTorque] = useState(text(sweep.torqueNm));
  const [notes, setNotes] = useState(sweep.notes);
  const [problem, setProblem] = useState<string | null>(null);
  const torques = useBoltTorques();
  const update = useUpdateSweepDetails(sweep.id);
  const online = useOnline();
  const bolts = torques.data?.bolts ?? [];
  const usual = bolts.find((b) => b.boltSize === boltSize)?.torqueNm;

  function submit(e: FormEvent) {
    e.preventDefault();
    const t = number(temperature);
    const q = number(torque);
    if (t === 'bad') return setProblem('Temperature must be a number of °C');
    if (q === 'bad') return setProblem('Torque must be a number of N·m');
    if (!takenBy.trim()) return setProblem('Say who took the sweep');
    // Only what changed is sent: the history then names exactly what was corrected.
    const patch: SweepDetailsPatch = {};
    if (instrument.trim() !== sweep.instrument) patch.instrument = instrument.trim();
    if (t !== sweep.temperatureC) patch.temperatureC = t;
    if (takenBy.trim() !== sweep.takenBy) patch.takenBy = takenBy.trim();
    if ((datum.trim() || null) !== sweep.datum) patch.datum = datum.trim() || null;
    if ((boltSize || null) !== sweep.boltSize) patch.boltSize = boltSize || null;
    if (q !== sweep.torqueNm) patch.torqueNm = q;
    if (notes !== sweep.notes) patch.notes = notes;
    setProblem(null);
    if (!Object.keys(patch).length) return onClose();
    update.mutate(patch, { onSuccess: onClose });
  }

  return (
    <Box component="form" onSubmit={submit} noValidate sx={{ display: 'contents' }}>
      <DialogContent>
        <DialogContentText sx={{ mb: 2 }}>
          The readings and the result stay as they were taken. The change is kept in the machine&apos;s history with the
          values before and after.
        </DialogContentText>
        <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' } }}>
          <TextField
            autoFocus
            label="Datum"
            value={datum}
            onChange={(e) => setDatum(e.target.value)}
            helperText="The common datum, named the same on the partner rail"
            sx={{ gridColumn: '1 / -1' }}
            slotProps={{ htmlInput: { maxLength: 120 } }}
          />
          <TextField
            label="Instrument"
            value={instrument}
            onChange={(e) => setInstrument(e.target.value)}
            sx={{ gridColumn: '1 / -1' }}
            slotProps={{ htmlInput: { maxLength: 120 } }}
          />
          <TextField
            label="Taken by"
            value={takenBy}
            onChange={(e) => setTakenBy(e.target.value)}
            slotProps={{ htmlInput: { maxLength: 120 } }}
          />
          <TextField
            label="Temperature"
            value={temperature}
            onChange={(e) => setTemperature(e.target.value)}
            slotProps={{
              htmlInput: { inputMode: 'decimal' },
              input: { endAdornment: <InputAdornment position="end">°C</InputAdornment> },
            }}
          />
          <TextField select label="Bolt size" value={boltSize} onChange={(e) => setBoltSize(e.target.value)}>
            <MenuItem value="">Not recorded</MenuItem>
            {/* A size recorded earlier stays choosable even if the table no longer lists it. */}
            {[
              ...bolts.map((b) => b.boltSize),
              ...(boltSize && !bolts.some((b) => b.boltSize === boltSize) ? [boltSize] : []),
            ].map((b) => (
              <MenuItem key={b} value={b}>
                {b}
              </MenuItem>
            ))}
          </TextField>
          <TextField
            label="Torque"
            value={torque}
            onChange={(e) => setTorque(e.target.value)}
            helperText={
              usual !== undefined && torque.trim() !== String(usual) ? `Usual for ${boltSize}: ${usual} N·m` : ' '
            }
            slotProps={{
              htmlInput: { inputMode: 'decimal' },
              input: { endAdornment: <InputAdornment position="end">N·m</InputAdornment> },
            }}
          />
          <TextField
            label="Notes"
            value={notes}
            onChange={(e) => setNotes(e.target.value)}
            multiline
            minRows={2}
            sx={{ gridColumn: '1 / -1' }}
            slotProps={{ htmlInput: { maxLength: 5000 } }}
          />
        </Box>
        {!online && (
          <Alert severity="warning" sx={{ mt: 2 }}>
            Correcting a sweep needs the connection; it is not kept on this device.
          </Alert>
        )}
        {(problem || update.error) && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {problem ?? update.error?.message}
          </Alert>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button type="submit" variant="contained" disabled={update.isPending || !online}>
          {update.isPending ? 'Saving…' : 'Save details'}
        </Button>
      </DialogActions>
    </Box>
  );
}
