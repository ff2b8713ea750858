import { queryOptions, useQuery } from '@tanstack/react-query';
import type { WeekView } from '@shared/schemas/week';
import { api } from '@/lib/api-client';
import { weekKeys } from '@/lib/query-keys';

export const getWeek = (hid: string, start: string) => api.get<WeekView>(`/households/${hid}/week?start=${start}`);

// Refetched often and on focus, so two people planning at once see each other's changes.
export const weekQueryOptions = (hid: string, start: string) =>
  queryOptions({
    queryKey: weekKeys.week(hid, start),
    queryFn: () => getWeek(hid, start),
    staleTime: 5_000,
    refetchInterval: 30_000,
  });

export const useWeek = (hid: string, start: string) => useQuery(weekQueryOptions(hid, start));
