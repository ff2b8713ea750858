import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CalendarFeedView, MealTimes } from '@shared/schemas/calendar';
import { api } from '@/lib/api-client';
import { calendarKeys } from '@/lib/query-keys';

const base = (hid: string) => `/households/${hid}`;

export const calendarFeedQueryOptions = (hid: string) =>
  queryOptions({
    queryKey: calendarKeys.feed(hid),
    queryFn: () => api.get<{ feed: CalendarFeedView }>(`${base(hid)}/calendar-feed`).then((r) => r.feed),
  });

export const useCalendarFeed = (hid: string) => useQuery(calendarFeedQueryOptions(hid));

/** Turns the address on or renews it; the answer is the only time the address itself is seen. */
export function useRenewCalendarFeed(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<{ feed: CalendarFeedView }>(`${base(hid)}/calendar-feed`).then((r) => r.feed),
    onSuccess: ({ address: _address, ...feed }) => queryClient.setQueryData(calendarKeys.feed(hid), feed),
  });
}

export function useTurnOffCalendarFeed(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete(`${base(hid)}/calendar-feed`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: calendarKeys.feed(hid) }),
  });
}

export function useSetMealTimes(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (times: MealTimes) =>
      api.put<{ feed: CalendarFeedView }>(`${base(hid)}/meal-times`, times).then((r) => r.feed),
    onSuccess: (feed) => queryClient.setQueryData(calendarKeys.feed(hid), feed),
  });
}
