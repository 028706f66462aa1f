import 'server-only';
import { isIPv4, isIPv6 } from 'node:net';
import { env } from '../env';
import { installPeerAddressHook, peerAddress } from './peer-address';

// Every route that rate-limits by address loads this module, so the hook is on from the first such request.
installPeerAddressHook();

/** Requests whose address is not known (no stamp yet in this process, or an in-process call) share this key. */
export const UNKNOWN_ADDRESS = 'unknown';
const MAX_KEY_LENGTH = 64;

/**
 * The client's address for rate limits. X-Forwarded-For is believed only as far as TRUSTED_PROXY_HOPS says our own
 * proxies wrote it: with N hops, the Nth entry from the right is the address our outermost proxy saw (entries further
 * left are whatever the client sent). With 0, the header is ignored and the socket address is used.
 */
export function clientAddress(req: Request, hops: number = env().TRUSTED_PROXY_HOPS): string {
  if (hops > 0) {
    const chain = (req.headers.get('x-forwarded-for') ?? '').split(',').map((entry) => entry.trim()).filter(Boolean);
    // Fewer entries than hops: every entry was written by a proxy of ours, so the leftmost is the furthest known.
    const entry = chain[Math.max(0, chain.length - hops)];
    if (entry) return addressKey(entry);
  }
  return addressKey(peerAddress(req.headers) ?? UNKNOWN_ADDRESS);
}

/**
 * One key per client: IPv4 as is (ports and IPv4-mapped IPv6 forms removed), IPv6 by its /64 prefix, because one
 * subscriber usually holds a whole /64 and could otherwise take a fresh address per attempt (common practice).
 */
export function addressKey(raw: string): string {
  let address = raw.trim().toLowerCase();
  const bracketed = /^\[([^\]]+)\](?::\d+)?$/.exec(address);
  if (bracketed) address = bracketed[1]!;
  else if (/^[\d.]+:\d+$/.test(address)) address = address.slice(0, address.lastIndexOf(':'));
  address = address.replace(/%.*$/, ''); // an IPv6 zone names the local interface, not the client
  if (isIPv4(address)) return address;
  if (isIPv6(address)) {
    const groups = ipv6Groups(address);
    // ::ffff:a.b.c.d is an IPv4 client on a dual-stack socket.
    if (groups.slice(0, 5).every((g) => g === 0) && groups[5] === 0xffff) return [groups[6]! >> 8, groups[6]! & 255, groups[7]! >> 8, groups[7]! & 255].join('.');
    return `${groups.slice(0, 4).map((g) => g.toString(16)).join(':')}::/64`;
  }
  return address.slice(0, MAX_KEY_LENGTH) || UNKNOWN_ADDRESS;
}

// The eight 16-bit groups of a valid IPv6 address, with `::` expanded and a trailing dotted IPv4 as two groups.
function ipv6Groups(address: string): number[] {
  const part = (text: string | undefined) =>
    text
      ? text.split(':').flatMap((g) => {
          if (!g.includes('.')) return [parseInt(g, 16)];
          const [a = 0, b = 0, c = 0, d = 0] = g.split('.').map(Number);
          return [(a << 8) | b, (c << 8) | d];
        })
      : [];
  const [head, tail] = address.split('::');
  const left = part(head);
  const right = part(tail);
  return [...left, ...Array<number>(Math.max(0, 8 - left.length - right.length)).fill(0), ...right];
}
