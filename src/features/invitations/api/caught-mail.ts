import { useQuery } from '@tanstack/react-query';
import type { CaughtMail } from '@shared/schemas/caught-mail';
import { api } from '@/lib/api-client';
import { devMailKeys } from '@/lib/query-keys';

/** Development only: the local mail catcher's messages; the server answers 404 elsewhere. */
export const useCaughtMail = (hid: string, enabled: boolean) =>
  useQuery({
    queryKey: devMailKeys.list(hid),
    queryFn: () => api.get<{ messages: CaughtMail[] }>(`/households/${hid}/dev/mail`).then((r) => r.messages),
    enabled,
    retry: false,
  });
