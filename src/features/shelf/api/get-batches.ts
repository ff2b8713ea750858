import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BatchDetail, BatchView } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { shelfKeys } from '@/lib/query-keys';

export const getBatches = (hid: string) =>
  api.get<{ batches: BatchView[] }>(`/households/${hid}/batches`).then((r) => r.batches);
export const batchesQueryOptions = (hid: string) =>
  queryOptions({ queryKey: shelfKeys.batches(hid), queryFn: () => getBatches(hid) });
export const useBatches = (hid: string) => useQuery(batchesQueryOptions(hid));

export const getBatch = (hid: string, batchId: string) =>
  api.get<{ batch: BatchDetail }>(`/households/${hid}/batches/${batchId}`).then((r) => r.batch);
export const batchQueryOptions = (hid: string, batchId: string) =>
  queryOptions({ queryKey: shelfKeys.batch(hid, batchId), queryFn: () => getBatch(hid, batchId) });
export const useBatch = (hid: string, batchId: string) => useQuery(batchQueryOptions(hid, batchId));
