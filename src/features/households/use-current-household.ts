import { useParams } from 'react-router-dom';
import { useMe } from '@/features/auth';

const LAST_HOUSEHOLD = 'larderly.lastHousehold';

/** The household in the address, with the signed-in person's role in it. */
export function useCurrentHousehold() {
  const { hid = '' } = useParams();
  const { data: me } = useMe();
  const membership = me?.memberships.find((m) => m.householdId === hid);
  return { hid, membership, role: membership?.role, me };
}

export function rememberHousehold(hid: string) {
  try {
    localStorage.setItem(LAST_HOUSEHOLD, hid);
  } catch {
    // private mode: nothing to remember
  }
}

export function lastHousehold() {
  try {
    return localStorage.getItem(LAST_HOUSEHOLD);
  } catch {
    return null;
  }
}
