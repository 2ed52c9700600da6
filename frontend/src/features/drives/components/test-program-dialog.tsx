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
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { FormTextField } from '../../../components/form/form-text-field';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import { useDownloadTestProgram } from '../api/download-test-program';
import { useTestTargets } from '../api/test-program-targets';
import type { Axis } from '../types';
import { errorText } from '../utils/format';
import { FormNumberInput } from './form-number-input';
import {
  testProgramFormOf,
  testProgramFormSchema,
  toTestProgramParams,
  type TestProgramFormValues,
} from './test-program-form-schema';

/** Parameters of the G-code test program; blank fields take the server's defaults. */
export function TestProgramDialog({ axis, open, onClose }: { axis: Axis; open: boolean; onClose: () => void }) {
  // Kept while the page stays: closed and opened again, the dialog offers the settings last used.
  const form = useForm<TestProgramFormValues>({
    defaultValues: testProgramFormOf(axis),
    resolver: zodResolver(testProgramFormSchema),
  });
  const [kind, lengthUnit] = useWatch({ control: form.control, name: ['kind', 'lengthUnit'] });
  const serverTargets = useTestTargets(axis.id);
  const download = useDownloadTestProgram(axis.id);
  const done = download.data;

  const submit = form.handleSubmit((values) => download.mutate(toTestProgramParams(values)));
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
          <Controller
            name="kind"
            control={form.control}
            render={({ field }) => (
              <ToggleButtonGroup
                exclusive
                size="small"
                value={field.value}
                onChange={(_, v: TestProgramFormValues['kind'] | null) => v && field.onChange(v)}
                aria-label="Kind of test program"
              >
                <ToggleButton value="positioning">Repeat-and-reverse run</ToggleButton>
                <ToggleButton value="travel">Travel trial</ToggleButton>
              </ToggleButtonGroup>
            )}
          />
          <Typography variant="body2" color="text.secondary">
            {kind === 'positioning'
              ? 'Each target is approached moving up, then moving down, with an overrun beyond the end targets before reversing; an optional stop (M1) and a dwell at each target for the reading.'
              : 'Moves out from the start to each distance, makes an optional stop (M1) for the measurement and comes back, taking up backlash the same way each time.'}{' '}
            Before running, set the axis zero at the end its travel is measured from; positive moves go away from it. A
            safety line (G17, G21 or G20, G90, G94, G40) comes before any move.
          </Typography>
          <Controller
            name="lengthUnit"
            control={form.control}
            render={({ field }) => (
              <UnitFamilySelect family="length" label="Values below in" value={field.value} onChange={field.onChange} />
            )}
          />
          <Box sx={grid}>
            <FormNumberInput
              form={form}
              name="feed"
              label="Feed rate"
              unit={`${lu}/min`}
              helperText={`Blank: ${defaultFeed} ${lu}/min`}
            />
            <FormNumberInput
              form={form}
              name="overrun"
              label="Overrun"
              unit={lu}
              helperText="Past the target before the approach; blank: 5 mm"
            />
            {kind === 'positioning' ? (
              <>
                <FormNumberInput form={form} name="runs" label="Runs each way" helperText="ISO 230-2 asks for 5" />
                <FormNumberInput form={form} name="dwell" label="Dwell at each target" unit="s" />
              </>
            ) : (
              <FormNumberInput
                form={form}
                name="start"
                label="Start"
                unit={lu}
                helperText="Blank: the overrun from zero"
              />
            )}
            <Controller
              name="letter"
              control={form.control}
              render={({ field }) => (
                <TextField
                  label="G-code axis letter"
                  name={field.name}
                  value={field.value}
                  // One letter, upper case, as G-code writes an axis.
                  onChange={(e) => field.onChange(e.target.value.toUpperCase().slice(0, 1))}
                  onBlur={field.onBlur}
                  inputRef={field.ref}
                  helperText={axis.letter ? `From the name ${axis.name}` : 'The name gives none: X, Y or Z…'}
                />
              )}
            />
          </Box>
          {kind === 'positioning' ? (
            <FormTextField
              key="targets"
              form={form}
              name="targets"
              label={`Targets (${lu}, comma-separated)`}
              helperText={targetsHint}
            />
          ) : (
            <FormTextField
              key="distances"
              form={form}
              name="distances"
              label={`Distances from the start (${lu}, comma-separated)`}
              helperText={
                axis.measuredTravelMm
                  ? 'Blank: a quarter, half, three quarters and all of the travel'
                  : 'Needed: the axis has no measured travel'
              }
            />
          )}
          <FormTextField
            form={form}
            name="notes"
            label="A note for the program's header"
            helperText="Brackets, semicolons, % and line breaks are left out so the note stays a comment"
            slotProps={{ htmlInput: { maxLength: 200 } }}
          />
          <FormTextField form={form} name="format" select label="File type" sx={{ maxWidth: 200 }}>
            <MenuItem value="nc">.nc (G-code)</MenuItem>
            <MenuItem value="txt">.txt (plain text)</MenuItem>
          </FormTextField>
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
