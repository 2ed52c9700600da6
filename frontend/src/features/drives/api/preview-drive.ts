import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { driveKeys } from '../types';

/** The drive calculator's request (the server's DriveCalculationDto for /api/calc/drive). */
export type DrivePreviewInput = Schemas['DriveCalculationDto'];

/** Theoretical steps per mm while the form is typed, from the calculators API (nothing saved). */
export const drivePreviewQueryOptions = (input: DrivePreviewInput | null) =>
  queryOptions({
    queryKey: driveKeys.preview(input),
    queryFn: () => answer(client.POST('/api/calc/drive', { body: input! })),
    enabled: input !== null,
    placeholderData: keepPreviousData,
    retry: false,
  });

export const useDrivePreview = (input: DrivePreviewInput | null) => useQuery(drivePreviewQueryOptions(input));
