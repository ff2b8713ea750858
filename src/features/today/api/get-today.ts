import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TodayView } from '@shared/schemas/today';
import { api } from '@/lib/api-client';
import { todayKeys } from '@/lib/query-keys';

export const getToday = (hid: string) => api.get<TodayView>(`/households/${hid}/today`);

export const todayQueryOptions = (hid: string) =>
  queryOptions({ queryKey: todayKeys.view(hid), queryFn: () => getToday(hid) });

export const useToday = (hid: string) => useQuery(todayQueryOptions(hid));
