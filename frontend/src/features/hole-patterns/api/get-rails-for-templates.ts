import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { holePatternKeys, type RailForTemplate } from '../types';

/** The machine's rails, for their templates (read through the rails route; holes come derived). */
export const railsForTemplatesQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: holePatternKeys.rails(machineId),
    queryFn: (): Promise<RailForTemplate[]> =>
      answer(client.GET('/api/machines/{id}/rails', { params: { path: { id: machineId } } })),
  });

export const useRailsForTemplates = (machineId: string) => useQuery(railsForTemplatesQueryOptions(machineId));
