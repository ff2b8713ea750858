import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PlaceView } from '@shared/schemas/places';
import { api } from '@/lib/api-client';
import { shelfKeys } from '@/lib/query-keys';

export const getPlaces = (hid: string) =>
  api.get<{ places: PlaceView[] }>(`/households/${hid}/places`).then((r) => r.places);

export const placesQueryOptions = (hid: string) =>
  queryOptions({ queryKey: shelfKeys.places(hid), queryFn: () => getPlaces(hid) });

export const usePlaces = (hid: string) => useQuery(placesQueryOptions(hid));
