import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { peopleKeys, type Person } from '../types';

export const peopleQueryOptions = () => queryOptions({ queryKey: peopleKeys.all, queryFn: () => api.get<Person[]>('/people') });

export const usePeople = () => useQuery(peopleQueryOptions());
