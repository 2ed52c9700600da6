import { useCalculation } from './run-calculation';
import type { DriveRequest, DriveResult } from '../types';

/** POST /api/calc/drive */
export const useDriveCalculation = (body: DriveRequest | null) =>
  useCalculation<DriveRequest, DriveResult>('drive', body);
