import { queryOptions, useQuery } from '@tanstack/react-query';
import type { HouseholdView, MemberView } from '@shared/schemas/households';
import { api } from '@/lib/api-client';
import { householdKeys } from '@/lib/query-keys';

export const getHousehold = (hid: string) =>
  api.get<{ household: HouseholdView }>(`/households/${hid}`).then((r) => r.household);

export const householdQueryOptions = (hid: string) =>
  queryOptions({ queryKey: householdKeys.detail(hid), queryFn: () => getHousehold(hid) });

export const useHousehold = (hid: string) => useQuery(householdQueryOptions(hid));

export const getMembers = (hid: string) =>
  api.get<{ members: MemberView[] }>(`/households/${hid}/members`).then((r) => r.members);

export const membersQueryOptions = (hid: string) =>
  queryOptions({ queryKey: householdKeys.members(hid), queryFn: () => getMembers(hid) });

export const useMembers = (hid: string) => useQuery(membersQueryOptions(hid));
