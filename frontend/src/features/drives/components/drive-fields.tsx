import { Box, MenuItem, TextField, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import { DRIVE_LABELS, MOUNTING_LABELS, type DriveType, type Mounting } from '../types';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { NumberInput } from './number-input';

export interface DriveDraft {
  type: DriveType;
  /** A screw's lead given as a length or as threads per inch. */
  leadAs: 'length' | 'tpi';
  lead: string;
  threadsPerInch: string;
  nominalDiameter: string;
  rootDiameter: string;
  unsupportedLength: string;
  mounting: Mounting | '';
  dnLimit: string;
  beltPitch: string;
  pulleyTeeth: string;
  pinionModule: string;
  pinionTeeth: string;
}

const grid = { display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' }, gap: 2 } as const;

/** The drive's own fields, switched by its type; lengths in the axis's unit (the pinion module in mm). */
export function DriveFields({
  draft,
  onChange,
  unit,
}: {
  draft: DriveDraft;
  onChange: (d: DriveDraft) => void;
  unit: LengthUnit;
}) {
  const set = (k: keyof DriveDraft) => (v: string) => onChange({ ...draft, [k]: v });
  const u = UNIT_LABELS[unit];
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Box>
        <Typography variant="body2" color="text.secondary" sx={{ mb: 0.5 }} id="drive-type-label">
          Drive
        </Typography>
        <ToggleButtonGroup
          exclusive
          size="small"
          value={draft.type}
          onChange={(_, v) => v && onChange({ ...draft, type: v })}
          aria-labelledby="drive-type-label"
        >
          {(Object.keys(DRIVE_LABELS) as DriveType[]).map((t) => (
            <ToggleButton key={t} value={t} sx={{ px: 2 }}>
              {DRIVE_LABELS[t]}
            </ToggleButton>
          ))}
        </ToggleButtonGroup>
      </Box>
      {draft.type === 'screw' && (
        <>
          <Box sx={grid}>
            <Box sx={{ display: 'flex', gap: 1, alignItems: 'flex-start' }}>
              <TextField
                select
                label="Lead given as"
                value={draft.leadAs}
                onChange={(e) => onChange({ ...draft, leadAs: e.target.value as DriveDraft['leadAs'] })}
                sx={{ minWidth: 150 }}
              >
                <MenuItem value="length">Lead ({u})</MenuItem>
                <MenuItem value="tpi">Threads per inch</MenuItem>
              </TextField>
              {draft.leadAs === 'tpi' ? (
                <NumberInput
                  label="Threads per inch"
                  unit="TPI"
                  required
                  value={draft.threadsPerInch}
                  onChange={set('threadsPerInch')}
                  helperText="Single-start screw: lead = 1 ÷ TPI inch"
                />
              ) : (
                <NumberInput
                  label="Lead"
                  unit={u}
                  required
                  value={draft.lead}
                  onChange={set('lead')}
                  helperText="Pitch × starts: travel per screw turn"
                />
              )}
            </Box>
            <NumberInput
              label="Nominal diameter"
              unit={u}
              value={draft.nominalDiameter}
              onChange={set('nominalDiameter')}
            />
            <NumberInput
              label="Root diameter"
              unit={u}
              value={draft.rootDiameter}
              onChange={set('rootDiameter')}
              helperText="Thread root (core); about 12.9 mm (0.51 in) on a rolled 16 × 5"
            />
            <NumberInput
              label="Length between supports"
              unit={u}
              value={draft.unsupportedLength}
              onChange={set('unsupportedLength')}
              helperText="Unsupported length the screw can whirl over"
            />
            <TextField
              select
              label="End mounting"
              value={draft.mounting}
              onChange={(e) => onChange({ ...draft, mounting: e.target.value as Mounting })}
            >
              <MenuItem value="">
                <em>Not known yet</em>
              </MenuItem>
              {(Object.keys(MOUNTING_LABELS) as Mounting[]).map((m) => (
                <MenuItem key={m} value={m}>
                  {MOUNTING_LABELS[m]}
                </MenuItem>
              ))}
            </TextField>
            <NumberInput
              label="d·n limit of the nut"
              unit="mm·rpm"
              value={draft.dnLimit}
              onChange={set('dnLimit')}
              helperText="Blank: 70 000, usual for rolled screws"
            />
          </Box>
          <Typography variant="body2" color="text.secondary">
            Diameters, length and mounting are needed only for the speed check.
          </Typography>
        </>
      )}
      {draft.type === 'belt' && (
        <Box sx={grid}>
          <NumberInput label="Belt pitch" unit={u} required value={draft.beltPitch} onChange={set('beltPitch')} />
          <NumberInput label="Pulley teeth" required value={draft.pulleyTeeth} onChange={set('pulleyTeeth')} />
        </Box>
      )}
      {draft.type === 'rack' && (
        <Box sx={grid}>
          <NumberInput
            label="Pinion module"
            unit="mm"
            required
            value={draft.pinionModule}
            onChange={set('pinionModule')}
            helperText="Always in mm: one pinion turn moves π × module × teeth"
          />
          <NumberInput label="Pinion teeth" required value={draft.pinionTeeth} onChange={set('pinionTeeth')} />
        </Box>
      )}
    </Box>
  );
}
