import type { AnswerOf, Schemas } from '../../lib/api/schemas';

// Requests and responses of the calculators API. Lengths (positions, moves, sizes, lead, travel)
// in `lengthUnit`, readings (indicator readings, deviations, heights) in `readingUnit`; every
// length in a response is in mm, and `units` names the unit of each result field.

/** The two unit families every calculator request names (the server takes mm when absent; the browser always sends both). */
export type UnitFamilies = Required<Pick<Schemas['StraightnessDto'], 'lengthUnit' | 'readingUnit'>>;

/** Something a person should know about a result: a stable code and a plain sentence. */
export type ResultWarning = Schemas['ResultWarning'];

export type StraightnessRequest = Schemas['StraightnessDto'] & UnitFamilies;
/** Asked with ?residuals=true, so each line carries its residuals. */
export type StraightnessResult = AnswerOf<'/api/calc/straightness', 'post'> & { leastSquares: { residuals: number[] } };

export type ParallelismRequest = Schemas['ParallelismDto'] & UnitFamilies;
export type ParallelismResult = AnswerOf<'/api/calc/parallelism', 'post'>;

export type SquarenessRequest = Schemas['SquarenessDto'] & UnitFamilies;
export type SquarenessResult = AnswerOf<'/api/calc/squareness', 'post'>;

export type FlatnessRequest = Schemas['FlatnessDto'] & UnitFamilies;
/** Asked with ?residuals=true, so the plane carries its residuals. */
export type FlatnessResult = AnswerOf<'/api/calc/flatness', 'post'> & { leastSquares: { residuals: number[] } };

export type DriveRequest = Schemas['DriveCalculationDto'] & UnitFamilies;
export type DriveType = DriveRequest['type'];
export type DriveResult = AnswerOf<'/api/calc/drive', 'post'>;

export type TravelTrialRequest = Schemas['TravelTrialDto'] & UnitFamilies;
export type TravelTrialResult = AnswerOf<'/api/calc/travel-trial', 'post'>;

export type PositioningRequest = Schemas['PositioningDto'] & UnitFamilies;
export type PositioningResult = AnswerOf<'/api/calc/positioning', 'post'>;
export type PositioningTarget = PositioningResult['targets'][number];

export type ScrewSpeedRequest = Schemas['ScrewSpeedDto'] & UnitFamilies;
export type Mounting = ScrewSpeedRequest['mounting'];
export type ScrewSpeedResult = AnswerOf<'/api/calc/screw-speed', 'post'>;

/** Query keys: one per calculator, with the request body so equal inputs share a result. */
export const calculatorKeys = {
  all: ['calculators'] as const,
  run: (calculator: string, body: unknown) => ['calculators', calculator, body] as const,
};
