import type { DigestContent } from './mail/digest-mail';

/**
 * The hook the restock feature fills: the suggestions the weekly digest lists under
 * "Time to make more". An empty list leaves that section out of the e-mail.
 */
export async function digestRestockLines(_householdId: string, _today: string): Promise<DigestContent['restock']> {
  return [];
}
