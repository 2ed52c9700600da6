import { useState } from 'react';
import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  MenuItem,
  Stack,
  TextField,
  ToggleButton,
  ToggleButtonGroup,
  Typography,
} from '@mui/material';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { fromMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useDownloadTestProgram } from '../api/download-test-program';
import { useTestTargets } from '../api/test-program-targets';
import type { Axis } from '../types';
import { errorText } from '../utils/format';
import { NumberInput, numberOf } from './number-input';

type Kind = 'travel' | 'positioning';

/** Parameters of the G-code test program; blank fields take the server's defaults. */
export function TestProgramDialog({ axis, open, onClose }: { axis: Axis; open: boolean; onClose: () => void }) {
  const [kind, setKind] = useState<Kind>('positioning');
  const [feed, setFeed] = useState('');
  const [overrun, setOverrun] = useState('');
  const [runs, setRuns] = useState('5');
  const [dwell, setDwell] = useState('4');
  const [targets, setTargets] = useState('');
  const [distances, setDistances] = useState('');
  const [start, setStart] = useState('');
  const [letter, setLetter] = useState(axis.letter ?? '');
  const [format, setFormat] = useState<'nc' | 'txt'>('nc');
  const [notes, setNotes] = useState('');
  const [lengthUnit, setLengthUnit] = useState<LengthUnit>(() => axis.lengthUnit ?? 'mm');
  const serverTargets = useTestTargets(axis.id);
  const download = useDownloadTestProgram(axis.id);
  const done = download.data;

  const submit = () =>
    download.mutate({
      kind,
      feed: numberOf(feed),
      overrun: numberOf(overrun),
      letter: letter.trim() || undefined,
      format,
      lengthUnit,
      notes: notes.trim() || undefined,
      ...(kind === 'positioning'
        ? { runs: numberOf(runs), dwell: numberOf(dwell), targets: targets.replace(/\s+/g, '') || undefined }
        : { distances: distances.replace(/\s+/g, '') || undefined, start: numberOf(start) }),
    });
  const close = () => {
    download.reset();
    onClose();
  };
  // The program's own default: 1000 mm/min, or the axis's fastest feed if lower, in the program's unit.
  const defaultFeed = +fromMm(Math.min(1000, axis.maxFeedRateMmPerMin ?? 1000), lengthUnit).toPrecision(4);
  const lu = UNIT_LABELS[lengthUnit];
  const st = serverTargets.data;
  const targetsHint = st
    ? st.targets.length
      ? `Blank: ${st.targets.join(', ')} ${UNIT_LABELS[st.lengthUnit]} - the same targets the entry grid offers (about five per metre, unevenly spaced)`
      : (st.reason ?? '')
    : 'Loading the default targets…';
  const grid = { display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' }, gap: 2 } as const;

  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="sm">
      <DialogTitle>Download a test program for axis {axis.name}</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          <Alert severity="warning">
            Run test programs with the plasma source or torch off and the spindle off, hands and people clear of the
            moving gantry, the E-stop within reach. Check the E-stop and try it at a low feed override first.
          </Alert>
          <ToggleButtonGroup
            exclusive
            size="small"
            value={kind}
            onChange={(_, v) => v && setKind(v)}
            aria-label="Kind of test program"
          >
            <ToggleButton value="positioning">Repeat-and-reverse run</ToggleButton>
            <ToggleButton value="travel">Travel trial</ToggleButton>
          </ToggleButtonGroup>
          <Typography variant="body2" color="text.secondary">
            {kind === 'positioning'
              ? 'Each target is approached moving up, then moving down, with an overrun beyond the end targets before reversing; an optional stop (M1) and a dwell at each target for the reading.'
              : 'Moves out from the start to each distance, makes an optional stop (M1) for the measurement and comes back, taking up backlash the same way each time.'}{' '}
            Before running, set the axis zero at the end its travel is measured from; positive moves go away from it. A
            safety line (G17, G21 or G20, G90, G94, G40) comes before any move.
          </Typography>
          <UnitFamilySelect family="length" label="Values below in" value={lengthUnit} onChange={setLengthUnit} />
          <Box sx={grid}>
            <NumberInput
              label="Feed rate"
              unit={`${lu}/min`}
              value={feed}
              onChange={setFeed}
              helperText={`Blank: ${defaultFeed} ${lu}/min`}
            />
            <NumberInput
              label="Overrun"
              unit={lu}
              value={overrun}
              onChange={setOverrun}
              helperText="Past the target before the approach; blank: 5 mm"
            />
            {kind === 'positioning' ? (
              <>
                <NumberInput label="Runs each way" value={runs} onChange={setRuns} helperText="ISO 230-2 asks for 5" />
                <NumberInput label="Dwell at each target" unit="s" value={dwell} onChange={setDwell} />
              </>
            ) : (
              <NumberInput
                label="Start"
                unit={lu}
                value={start}
                onChange={setStart}
                helperText="Blank: the overrun from zero"
              />
            )}
            <TextField
              label="G-code axis letter"
              value={letter}
              onChange={(e) => setLetter(e.target.value.toUpperCase().slice(0, 1))}
              helperText={axis.letter ? `From the name ${axis.name}` : 'The name gives none: X, Y or Z…'}
            />
          </Box>
          {kind === 'positioning' ? (
            <TextField
              label={`Targets (${lu}, comma-separated)`}
              value={targets}
              onChange={(e) => setTargets(e.target.value)}
              helperText={targetsHint}
            />
          ) : (
            <TextField
              label={`Distances from the start (${lu}, comma-separated)`}
              value={distances}
              onChange={(e) => setDistances(e.target.value)}
              helperText={
                axis.measuredTravelMm
                  ? 'Blank: a quarter, half, three quarters and all of the travel'
                  : 'Needed: the axis has no measured travel'
              }
            />
          )}
          <TextField
            label="A note for the program's header"
            value={notes}
            onChange={(e) => setNotes(e.target.value)}
            helperText="Brackets, semicolons, % and line breaks are left out so the note stays a comment"
            slotProps={{ htmlInput: { maxLength: 200 } }}
          />
          <TextField
            select
            label="File type"
            value={format}
            onChange={(e) => setFormat(e.target.value as 'nc' | 'txt')}
            sx={{ maxWidth: 200 }}
          >
            <MenuItem value="nc">.nc (G-code)</MenuItem>
            <MenuItem value="txt">.txt (plain text)</MenuItem>
          </TextField>
          {download.error && <Alert severity="error">{errorText(download.error)}</Alert>}
          {done && (
            <Alert severity="success">
              {done.filename} downloaded ({done.text.split('\n').length} lines). Switch optional stop on to stop at each
              reading. G4 P is read as seconds by RS-274/NGC controls; check yours.
            </Alert>
          )}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Close</Button>
        <Button variant="contained" onClick={submit} disabled={download.isPending}>
          Download
        </Button>
      </DialogActions>
    </Dialog>
  );
}
