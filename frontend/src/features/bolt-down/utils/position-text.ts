import { fromMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';

/** A hole's position (kept in mm) in the bolt-down's length unit, to six significant figures. */
export const positionIn = (mm: number, unit: LengthUnit): number => +fromMm(mm, unit).toPrecision(6);

/** "600 mm", "23.622 in". */
export const positionText = (mm: number, unit: LengthUnit): string => `${positionIn(mm, unit)} ${UNIT_LABELS[unit]}`;
