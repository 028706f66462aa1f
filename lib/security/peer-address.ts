import 'server-only';
import { randomBytes, timingSafeEqual } from 'node:crypto';
import diagnostics from 'node:diagnostics_channel';
import type { IncomingMessage } from 'node:http';
import type { Socket } from 'node:net';

// Next gives App Router handlers no socket address, and `next start` passes a client's own X-Forwarded-For through
// untouched (it fills the header in only when absent). Node publishes every request it receives on this channel,
// with its socket, before Next sees it: there we stamp the peer address onto the request's headers.
const REQUEST_START = 'http.server.request.start';
export const PEER_HEADER = 'x-stepwell-peer';

// The stamp carries a secret of this process, so a header a client sends before the hook is active is never believed.
interface PeerHook {
  secret: string;
}

const holder = globalThis as unknown as { stepwellPeerHook?: PeerHook };

function stampOf(hook: PeerHook, address: string): string {
  return `${hook.secret} ${address}`;
}

/** Subscribes once per process (route bundles may each load this module); later calls do nothing. */
export function installPeerAddressHook(): PeerHook {
  if (holder.stepwellPeerHook) return holder.stepwellPeerHook;
  const hook: PeerHook = { secret: randomBytes(18).toString('base64url') };
  // The module-level subscribe keeps the channel alive (a channel object alone may be collected with its subscribers).
  diagnostics.subscribe(REQUEST_START, (message) => {
    const { request, socket } = message as { request: IncomingMessage; socket: Socket };
    // Assigning replaces whatever the client sent under this name.
    request.headers[PEER_HEADER] = stampOf(hook, socket.remoteAddress ?? '');
  });
  holder.stepwellPeerHook = hook;
  return hook;
}

/** The socket address the hook stamped on this request; null when there is no stamp of this process (tests, or a request that arrived before the hook). */
export function peerAddress(headers: Headers): string | null {
  const hook = holder.stepwellPeerHook;
  const value = headers.get(PEER_HEADER);
  if (!hook || !value) return null;
  const space = value.indexOf(' ');
  const secret = Buffer.from(value.slice(0, Math.max(0, space)));
  const expected = Buffer.from(hook.secret);
  if (secret.length !== expected.length || !timingSafeEqual(secret, expected)) return null;
  return value.slice(space + 1) || null;
}

/** For in-process tests: the header a request from `address` carries once the hook is installed. */
export function peerStampFor(address: string): [string, string] {
  return [PEER_HEADER, stampOf(installPeerAddressHook(), address)];
}
