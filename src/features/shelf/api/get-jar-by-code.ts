import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JarByCode } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { shelfKeys } from '@/lib/query-keys';

export const getJarByCode = (code: string) => api.get<JarByCode>(`/jars/by-code/${encodeURIComponent(code)}`);
export const jarByCodeQueryOptions = (code: string) =>
  queryOptions({ queryKey: shelfKeys.jarByCode(code), queryFn: () => getJarByCode(code) });
export const useJarByCode = (code: string) => useQuery(jarByCodeQueryOptions(code));
