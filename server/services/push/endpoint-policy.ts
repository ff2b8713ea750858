import { lookup, type LookupAddress, type LookupOptions } from 'node:dns';
import { promises as dns } from 'node:dns';
import https from 'node:https';
import { BlockList, isIP } from 'node:net';
import { AppError } from '../../http/errors';

// Addresses a push service never has: loopback, private, link-local, CGNAT, multicast, unique-local,
// documentation and other special-purpose ranges (IANA special-purpose address registries).
// BlockList checks an IPv4-mapped IPv6 address (::ffff:a.b.c.d) against the IPv4 rules.
const notPublic = new BlockList();
for (const [net, prefix] of [
  ['0.0.0.0', 8],
  ['10.0.0.0', 8],
  ['100.64.0.0', 10],
  ['127.0.0.0', 8],
  ['169.254.0.0', 16],
  ['172.16.0.0', 12],
  ['192.0.0.0', 24],
  ['192.0.2.0', 24],
  ['192.88.99.0', 24],
  ['192.168.0.0', 16],
  ['198.18.0.0', 15],
  ['198.51.100.0', 24],
  ['203.0.113.0', 24],
  ['224.0.0.0', 4],
  ['240.0.0.0', 4],
] as const)
  notPublic.addSubnet(net, prefix, 'ipv4');
for (const [net, prefix] of [
  ['::', 128],
  ['::1', 128],
  ['64:ff9b::', 96],
  ['64:ff9b:1::', 48],
  ['100::', 64],
  ['2001::', 23],
  ['2001:db8::', 32],
  ['2002::', 16],
  ['fc00::', 7],
  ['fe80::', 10],
  ['fec0::', 10],
  ['ff00::', 8],
] as const)
  notPublic.addSubnet(net, prefix, 'ipv6');

export function isPublicAddress(address: string) {
  const family = isIP(address);
  if (family === 0) return false;
  return !notPublic.check(address, family === 4 ? 'ipv4' : 'ipv6');
}

const refuse = (why: string) =>
  new AppError(
    400,
    'invalid_input',
    `That push address cannot be used: ${why}. Turn notifications off and on again in this browser.`,
    { endpoint: why },
  );

/** The local push endpoint's origin when its development setting is on; its endpoints skip the public-address rule. */
export type LocalPushOrigin = string | undefined;

/**
 * A push endpoint must be https on port 443 without user-info, on a host whose every address is
 * public, so a subscription cannot make the server connect into a private network.
 */
export async function checkEndpoint(endpoint: string, localOrigin: LocalPushOrigin) {
  const url = new URL(endpoint);
  if (localOrigin && url.origin === localOrigin) return;
  if (url.protocol !== 'https:') throw refuse('it must be an https:// address');
  if (url.username || url.password) throw refuse('it must not carry a user name or password');
  if (url.port !== '' && url.port !== '443') throw refuse('it must use the standard https port, 443');
  const host = url.hostname.replace(/^\[|\]$/g, '');
  const addresses = isIP(host) ? [host] : await resolveAll(host);
  if (addresses.length === 0) throw refuse(`${host} could not be found`);
  if (!addresses.every(isPublicAddress)) throw refuse(`${host} is not a public internet address`);
}

/** Every address the system resolver gives, as the connection itself will look it up. */
async function resolveAll(host: string) {
  return (await dns.lookup(host, { all: true }).catch(() => [])).map((a) => a.address);
}

type LookupCallback = (error: NodeJS.ErrnoException | null, address: string | LookupAddress[], family?: number) => void;

/**
 * Checks the addresses again at connect time, so a host that resolved to public addresses when it
 * subscribed cannot later point the server at a private one (DNS rebinding).
 */
function publicOnlyLookup(hostname: string, options: LookupOptions, callback: LookupCallback) {
  lookup(hostname, { ...options, all: true }, (error, addresses) => {
    if (error) return callback(error, []);
    if (addresses.length === 0 || !addresses.every((a) => isPublicAddress(a.address))) {
      return callback(
        Object.assign(new Error(`${hostname} resolves to an address that is not public`), { code: 'ENOTPUBLIC' }),
        [],
      );
    }
    if (options.all) return callback(null, addresses);
    callback(null, addresses[0].address, addresses[0].family);
  });
}

/** The agent every push to a push service goes through. */
export const publicPushAgent = () => new https.Agent({ lookup: publicOnlyLookup as never, keepAlive: true });
