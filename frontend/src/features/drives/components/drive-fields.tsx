import { FormTextField } from '../../../components/form/form-text-field';
import { Box, MenuItem, TextField, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import { Controller, useWatch, type UseFormReturn } from 'react-hook-form';
import { DRIVE_LABELS, MOUNTING_LABELS, type DriveType, type Mounting } from '../types';
import { UNIT_LABELS } from '../../../lib/units';
import type { AxisFormValues } from './axis-form-schema';
import { FormNumberInput } from './form-number-input';

const grid = { display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' }, gap: 2 } as const;

/** The drive's own fields, switched by its type; lengths in the axis's unit (the pinion module in mm). */
export function DriveFields({ form }: { form: UseFormReturn<AxisFormValues> }) {
  const [type, leadAs, unit] = useWatch({ control: form.control, name: ['drive.type', 'drive.leadAs', 'lengthUnit'] });
  const u = UNIT_LABELS[unit];
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Box>
        <Typography variant="body2" color="text.secondary" sx={{ mb: 0.5 }} id="drive-type-label">
          Drive
        </Typography>
        <Controller
          name="drive.type"
          control={form.control}
          render={({ field }) => (
            <ToggleButtonGroup
              exclusive
              size="small"
              value={field.value}
              onChange={(_, v: DriveType | null) => v && field.onChange(v)}
              aria-labelledby="drive-type-label"
            >
              {(Object.keys(DRIVE_LABELS) as DriveType[]).map((t) => (
                <ToggleButton key={t} value={t} sx={{ px: 2 }}>
                  {DRIVE_LABELS[t]}
                </ToggleButton>
              ))}
            </ToggleButtonGroup>
          )}
        />
      </Box>
      {type === 'screw' && (
        <>
          <Box sx={grid}>
            <Box sx={{ display: 'flex', gap: 1, alignItems: 'flex-start' }}>
              <FormTextField form={form} name="drive.leadAs" select label="Lead given as" sx={{ minWidth: 150 }}>
                <MenuItem value="length">Lead ({u})</MenuItem>
                <MenuItem value="tpi">Threads per inch</MenuItem>
              </FormTextField>
              {leadAs === 'tpi' ? (
                <FormNumberInput
                  key="drive.threadsPerInch"
                  form={form}
                  name="drive.threadsPerInch"
                  label="Threads per inch"
                  unit="TPI"
                  required
                  helperText="Single-start screw: lead = 1 ÷ TPI inch"
                />
              ) : (
                <FormNumberInput
                  key="drive.lead"
                  form={form}
                  name="drive.lead"
                  label="Lead"
                  unit={u}
                  required
                  helperText="Pitch × starts: travel per screw turn"
                />
              )}
            </Box>
            <FormNumberInput form={form} name="drive.nominalDiameter" label="Nominal diameter" unit={u} />
            <FormNumberInput
              form={form}
              name="drive.rootDiameter"
              label="Root diameter"
              unit={u}
              helperText="Thread root (core); about 12.9 mm (0.51 in) on a rolled 16 × 5"
            />
            <FormNumberInput
              form={form}
              name="drive.unsupportedLength"
              label="Length between supports"
              unit={u}
              helperText="Unsupported length the screw can whirl over"
            />
            <Controller
              name="drive.mounting"
              control={form.control}
              render={({ field }) => (
                <TextField
                  select
                  label="End mounting"
                  value={field.value}
                  onChange={(e) => field.onChange(e.target.value as Mounting)}
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
              )}
            />
            <FormNumberInput
              form={form}
              name="drive.dnLimit"
              label="d·n limit of the nut"
              unit="mm·rpm"
              helperText="Blank: 70 000, usual for rolled screws"
            />
          </Box>
          <Typography variant="body2" color="text.secondary">
            Diameters, length and mounting are needed only for the speed check.
          </Typography>
        </>
      )}
      {type === 'belt' && (
        <Box sx={grid}>
          <FormNumberInput form={form} name="drive.beltPitch" label="Belt pitch" unit={u} required />
          <FormNumberInput form={form} name="drive.pulleyTeeth" label="Pulley teeth" required />
        </Box>
      )}
      {type === 'rack' && (
        <Box sx={grid}>
          <FormNumberInput
            form={form}
            name="drive.pinionModule"
            label="Pinion module"
            unit="mm"
            required
            helperText="Always in mm: one pinion turn moves π × module × teeth"
          />
          <FormNumberInput form={form} name="drive.pinionTeeth" label="Pinion teeth" required />
        </Box>
      )}
    </Box>
  );
}
