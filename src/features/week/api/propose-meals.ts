import { useMutation } from '@tanstack/react-query';
import type { ProposalRequest, ProposalView } from '@shared/schemas/week-proposal';
import { api } from '@/lib/api-client';

/** Asks for meals for the open slots; writes nothing, so nothing in the cache changes. */
export const proposeMeals = (hid: string, request: ProposalRequest) =>
  api.post<ProposalView>(`/households/${hid}/week/proposal`, request);

export const useProposeMeals = (hid: string) =>
  useMutation({ mutationFn: (request: ProposalRequest) => proposeMeals(hid, request) });
