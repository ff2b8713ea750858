import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JarView } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { shelfKeys } from '@/lib/query-keys';

type JarFilter = 'on-hand' | 'sealed' | 'opened' | 'all';

export const getJars = (hid: string, filter: JarFilter) =>
  api
    .get<{ jars: JarView[] }>(`/households/${hid}/jars${filter === 'on-hand' ? '' : `?state=${filter}`}`)
    .then((r) => r.jars);
export const jarsQueryOptions = (hid: string, filter: JarFilter = 'on-hand') =>
  queryOptions({ queryKey: shelfKeys.jars(hid, filter), queryFn: () => getJars(hid, filter) });
export const useJars = (hid: string, filter: JarFilter = 'on-hand') => useQuery(jarsQueryOptions(hid, filter));
