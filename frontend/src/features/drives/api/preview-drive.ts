import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys } from '../types';

export interface DrivePreviewInput {
  type: string;
  lengthUnit: string;
  motorStepsPerRev: number;
  microsteps: number;
  gearRatio?: number;
  lead?: number;
  threadsPerInch?: number;
  beltPitch?: number;
  pulleyTeeth?: number;
  pinionModule?: number;
  pinionTeeth?: number;
}

export interface DrivePreview {
  travelPerRev: number;
  travelPerMotorRev: number;
  stepsPerMm: number;
  resolution: number;
}

/** Theoretical steps per mm while the form is typed, from the calculators API (nothing saved). */
export const drivePreviewQueryOptions = (input: DrivePreviewInput | null) =>
  queryOptions({
    queryKey: driveKeys.preview(input),
    queryFn: () => api.post<DrivePreview>('/calc/drive', input),
    enabled: input !== null,
    placeholderData: keepPreviousData,
    retry: false,
  });

export const useDrivePreview = (input: DrivePreviewInput | null) => useQuery(drivePreviewQueryOptions(input));
