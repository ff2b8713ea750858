import type { OpeningAdvice } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';

/** Asked at the moment someone opens a jar, never cached: the fridge may have changed a minute ago. */
export const getOpeningAdvice = (hid: string, jarId: string) =>
  api.get<{ advice: OpeningAdvice }>(`/households/${hid}/jars/${jarId}/opening-advice`).then((r) => r.advice);
