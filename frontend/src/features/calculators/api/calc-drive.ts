import { answer, client } from '../../../lib/api-client';
import { useCalculation } from './run-calculation';
import type { DriveRequest } from '../types';

/** POST /api/calc/drive */
export const useDriveCalculation = (body: DriveRequest | null) =>
  useCalculation('drive', body, (b) => answer(client.POST('/api/calc/drive', { body: b })));
