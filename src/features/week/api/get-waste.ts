import { queryOptions, useQuery } from '@tanstack/react-query';
import type { WasteFigure } from '@shared/schemas/week-proposal';
import { api } from '@/lib/api-client';
import { weekKeys } from '@/lib/query-keys';

export const getWaste = (hid: string, start: string) =>
  api.get<WasteFigure>(`/households/${hid}/week/waste?start=${start}`);

export const wasteQueryOptions = (hid: string, start: string) =>
  queryOptions({ queryKey: weekKeys.waste(hid, start), queryFn: () => getWaste(hid, start), staleTime: 5_000 });

export const useWaste = (hid: string, start: string) => useQuery(wasteQueryOptions(hid, start));
