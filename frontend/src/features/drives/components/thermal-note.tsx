import { Typography } from '@mui/material';
import type { RecordConditions } from '../types';
import { SCALE_MATERIAL_LABELS } from '../types';

/** What was recorded about temperature, and whether the result was referred to 20 °C. */
export function ThermalNote({ record }: { record: RecordConditions }) {
  const t = record.thermal;
  if (record.machineTemperature === null && record.scaleTemperature === null) {
    return (
      <Typography variant="body2" color="text.secondary">
        No temperatures recorded: not referred to 20 °C.
      </Typography>
    );
  }
  const parts = [
    record.machineTemperature !== null ? `machine ${record.machineTemperature} °C` : null,
    record.scaleTemperature !== null ? `scale ${record.scaleTemperature} °C` : null,
    record.scaleMaterial ? SCALE_MATERIAL_LABELS[record.scaleMaterial].toLowerCase() : null,
  ].filter(Boolean);
  return (
    <Typography variant="body2" color="text.secondary">
      {parts.join(', ')}
      {t?.applied
        ? ` · referred to 20 °C with α = ${t.scaleAlphaUmPerMK} µm/m·K (scale) and ${t.machineAlphaUmPerMK} µm/m·K (machine, steel); ${t.source}`
        : ' · not referred to 20 °C (both temperatures are needed)'}
    </Typography>
  );
}
