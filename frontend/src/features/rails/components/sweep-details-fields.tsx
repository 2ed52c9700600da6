import { memo } from 'react';
import {
  Box,
  Button,
  InputAdornment,
  MenuItem,
  Stack,
  TextField,
  ToggleButton,
  ToggleButtonGroup,
  Typography,
} from '@mui/material';
import type { BoltTorques, SweepPhase } from '../types';
import type { SweepDraft } from '../hooks/use-sweep-draft';

type Details = Pick<
  SweepDraft,
  'instrument' | 'resolution' | 'temperatureC' | 'phase' | 'takenBy' | 'boltSize' | 'torqueNm' | 'datum' | 'notes'
>;

/** What a sweep records besides the readings: instrument, temperature, phase, who, bolts, datum. */
// Memoised: typing a reading does not re-render these fields (value is memoised by the form).
export const SweepDetailsFields = memo(function SweepDetailsFields({
  value,
  unitLabel,
  torques,
  onChange,
}: {
  value: Details;
  unitLabel: string;
  torques: BoltTorques | undefined;
  onChange: (patch: Partial<Details>) => void;
}) {
  const usual = torques?.bolts.find((b) => b.boltSize === value.boltSize);
  // The usual torque is offered (the "Use" button), never filled in: only a torque typed or accepted is recorded.
  const pickBolt = (boltSize: string) => onChange({ boltSize });
  const setPhase = (phase: SweepPhase) => onChange({ phase });
  return (
    <Stack spacing={2}>
      <Stack direction="row" spacing={1.5} useFlexGap sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Typography id="phase-label" color="text.secondary">
          This sweep is
        </Typography>
        <ToggleButtonGroup
          exclusive
          size="small"
          value={value.phase}
          onChange={(_, v) => v && setPhase(v)}
          aria-labelledby="phase-label"
        >
          <ToggleButton value="as-found">As found</ToggleButton>
          <ToggleButton value="as-left">As left</ToggleButton>
        </ToggleButtonGroup>
      </Stack>
      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr', lg: '2fr 1fr 1fr' } }}>
        <TextField
          label="Instrument"
          value={value.instrument}
          onChange={(e) => onChange({ instrument: e.target.value })}
          placeholder="Dial indicator on a carriage"
          sx={{ gridColumn: { sm: '1 / -1', lg: 'auto' } }}
        />
        <TextField
          label="Resolution"
          value={value.resolution}
          onChange={(e) => onChange({ resolution: e.target.value })}
          slotProps={{
            htmlInput: { inputMode: 'decimal' },
            input: { endAdornment: <InputAdornment position="end">{unitLabel}</InputAdornment> },
          }}
        />
        <TextField
          label="Temperature"
          value={value.temperatureC}
          onChange={(e) => onChange({ temperatureC: e.target.value })}
          slotProps={{
            htmlInput: { inputMode: 'decimal' },
            input: { endAdornment: <InputAdornment position="end">°C</InputAdornment> },
          }}
        />
        <TextField label="Taken by" value={value.takenBy} onChange={(e) => onChange({ takenBy: e.target.value })} />
        <TextField
          label="Datum"
          value={value.datum}
          onChange={(e) => onChange({ datum: e.target.value })}
          helperText="Name the common datum to compare partner rails"
          sx={{ gridColumn: { lg: 'span 2' } }}
        />
        <TextField
          select
          label="Bolt size"
          value={value.boltSize}
          onChange={(e) => pickBolt(e.target.value)}
          helperText="Bolts as tightened"
        >
          <MenuItem value="">Not recorded</MenuItem>
          {torques?.bolts.map((b) => (
            <MenuItem key={b.boltSize} value={b.boltSize}>
              {b.boltSize}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          label="Torque"
          value={value.torqueNm}
          onChange={(e) => onChange({ torqueNm: e.target.value })}
          slotProps={{
            htmlInput: { inputMode: 'decimal' },
            input: {
              endAdornment: (
                <InputAdornment position="end">
                  {usual && value.torqueNm !== String(usual.torqueNm) && (
                    <Button size="small" onClick={() => onChange({ torqueNm: String(usual.torqueNm) })} sx={{ mr: 1 }}>
                      Use {usual.torqueNm}
                    </Button>
                  )}
                  N·m
                </InputAdornment>
              ),
            },
          }}
          helperText={
            usual
              ? `Usual for ${usual.boltSize} into steel: ${usual.torqueNm} N·m (a rail maker's table; follow your rail's instructions)${value.torqueNm.trim() ? '' : ' — recorded only if typed or used'}`
              : 'Pick a bolt size for the usual torque'
          }
          sx={{ gridColumn: { lg: 'span 2' } }}
        />
      </Box>
      <TextField
        label="Notes"
        value={value.notes}
        onChange={(e) => onChange({ notes: e.target.value })}
        multiline
        minRows={2}
      />
    </Stack>
  );
});
