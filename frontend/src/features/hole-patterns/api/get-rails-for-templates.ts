import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { holePatternKeys, type RailForTemplate } from '../types';

/** The machine's rails, for their templates (read through the rails route; holes come derived). */
export const railsForTemplatesQueryOptions = (machineId: string) =>
  queryOptions({ queryKey: holePatternKeys.rails(machineId), queryFn: () => api.get<RailForTemplate[]>(`/machines/${machineId}/rails`) });

export const useRailsForTemplates = (machineId: string) => useQuery(railsForTemplatesQueryOptions(machineId));
