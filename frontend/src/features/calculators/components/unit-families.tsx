import { useState } from 'react';
import { Box } from '@mui/material';
import { UnitFamilySelect } from '../../../components/form/unit-select';
import type { LengthUnit } from '../../../lib/units';
import type { UnitFamilies } from '../types';

/** Both unit families of a calculator's form, with the defaults that suit it. */
export function useUnitFamilies(initial: UnitFamilies) {
  const [units, setUnits] = useState<UnitFamilies>(initial);
  return {
    units,
    setLengthUnit: (lengthUnit: LengthUnit) => setUnits((u) => ({ ...u, lengthUnit })),
    setReadingUnit: (readingUnit: LengthUnit) => setUnits((u) => ({ ...u, readingUnit })),
  };
}

/**
 * The two pickers side by side: lengths (positions, moves, sizes, lead, travel) and readings
 * (indicator readings, deviations, heights). A calculator without readings shows the first only.
 */
export function UnitFamilyPickers({
  units,
  setLengthUnit,
  setReadingUnit,
  lengthLabel,
  readingLabel,
  readings = true,
}: ReturnType<typeof useUnitFamilies> & { lengthLabel?: string; readingLabel?: string; readings?: boolean }) {
  return (
    <Box sx={{ display: 'flex', gap: 2, flexWrap: 'wrap' }}>
      <UnitFamilySelect family="length" label={lengthLabel} value={units.lengthUnit} onChange={setLengthUnit} />
      {readings && (
        <UnitFamilySelect family="reading" label={readingLabel} value={units.readingUnit} onChange={setReadingUnit} />
      )}
    </Box>
  );
}
