// Which address a rate limit keys on: the socket's, unless TRUSTED_PROXY_HOPS names proxies of ours.
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readEnv } from '@/lib/env';
import { addressKey, clientAddress, UNKNOWN_ADDRESS } from '@/lib/security/client-address';
import { PEER_HEADER, peerStampFor } from '@/lib/security/peer-address';

const request = (headers: Record<string, string>) => new Request('http://localhost:3000/api/signup', { headers });
const fromPeer = (address: string, extra: Record<string, string> = {}) => request({ ...Object.fromEntries([peerStampFor(address)]), ...extra });

describe('addressKey', () => {
  it('keeps IPv4 addresses and drops ports and the IPv4-mapped IPv6 form', () => {
    expect(addressKey('203.0.113.7')).toBe('203.0.113.7');
    expect(addressKey(' 203.0.113.7:51234 ')).toBe('203.0.113.7');
    expect(addressKey('::ffff:198.51.100.4')).toBe('198.51.100.4');
    expect(addressKey('[::FFFF:198.51.100.4]:8080')).toBe('198.51.100.4');
    expect(addressKey('0:0:0:0:0:ffff:c633:6404')).toBe('198.51.100.4');
  });

  it('keys IPv6 by its /64, so one subscriber cannot take a fresh address per attempt', () => {
    expect(addressKey('2001:db8:1:2::1')).toBe('2001:db8:1:2::/64');
    expect(addressKey('2001:DB8:1:2:aaaa:bbbb:cccc:dddd')).toBe('2001:db8:1:2::/64');
    expect(addressKey('[2001:db8:1:2::99]:443')).toBe('2001:db8:1:2::/64');
    expect(addressKey('2001:db8:1:3::1')).not.toBe(addressKey('2001:db8:1:2::1'));
    expect(addressKey('::1')).toBe('0:0:0:0::/64');
    expect(addressKey('fe80::1%eth0')).toBe('fe80:0:0:0::/64');
  });

  it('keeps anything else as a bounded string', () => {
    expect(addressKey('unknown')).toBe('unknown');
    expect(addressKey('x'.repeat(500))).toHaveLength(64);
    expect(addressKey('')).toBe(UNKNOWN_ADDRESS);
  });
});

describe('clientAddress', () => {
  it('with no trusted proxy, ignores X-Forwarded-For and uses the stamped socket address', () => {
    expect(clientAddress(fromPeer('198.51.100.20', { 'x-forwarded-for': '203.0.113.99' }), 0)).toBe('198.51.100.20');
    expect(clientAddress(request({ 'x-forwarded-for': '203.0.113.99' }), 0)).toBe(UNKNOWN_ADDRESS);
    expect(clientAddress(request({ 'x-real-ip': '203.0.113.98' }), 0)).toBe(UNKNOWN_ADDRESS);
  });

  it('refuses a peer header the client wrote itself', () => {
    expect(clientAddress(request({ [PEER_HEADER]: '203.0.113.5' }), 0)).toBe(UNKNOWN_ADDRESS);
    expect(clientAddress(request({ [PEER_HEADER]: 'guessed-secret 203.0.113.5' }), 0)).toBe(UNKNOWN_ADDRESS);
  });

  it('with N trusted proxies, takes the Nth address from the right', () => {
    const chain = { 'x-forwarded-for': '203.0.113.99, 198.51.100.7, 10.0.0.2' };
    expect(clientAddress(fromPeer('10.0.0.3', chain), 1)).toBe('10.0.0.2');
    expect(clientAddress(fromPeer('10.0.0.3', chain), 2)).toBe('198.51.100.7');
    expect(clientAddress(fromPeer('10.0.0.3', chain), 3)).toBe('203.0.113.99');
    // Fewer entries than hops: all were written by our proxies; the leftmost is the furthest known.
    expect(clientAddress(fromPeer('10.0.0.3', { 'x-forwarded-for': '198.51.100.7' }), 2)).toBe('198.51.100.7');
    // Two X-Forwarded-For lines count as one list.
    const twoLines = new Headers([['x-forwarded-for', '203.0.113.99'], ['x-forwarded-for', '198.51.100.8']]);
    expect(clientAddress(new Request('http://localhost:3000/', { headers: twoLines }), 1)).toBe('198.51.100.8');
    // No header at all (a proxy that forgot it): the socket, which is then the proxy itself.
    expect(clientAddress(fromPeer('10.0.0.3'), 1)).toBe('10.0.0.3');
  });

  it('reads TRUSTED_PROXY_HOPS from the environment', () => {
    const before = process.env.TRUSTED_PROXY_HOPS;
    try {
      process.env.TRUSTED_PROXY_HOPS = '1';
      expect(clientAddress(request({ 'x-forwarded-for': '203.0.113.99, 198.51.100.9' }))).toBe('198.51.100.9');
      delete process.env.TRUSTED_PROXY_HOPS;
      expect(clientAddress(request({ 'x-forwarded-for': '203.0.113.99, 198.51.100.9' }))).toBe(UNKNOWN_ADDRESS);
    } finally {
      if (before === undefined) delete process.env.TRUSTED_PROXY_HOPS;
      else process.env.TRUSTED_PROXY_HOPS = before;
    }
  });
});

describe('TRUSTED_PROXY_HOPS in the environment schema', () => {
  it('defaults to 0 and takes a small whole number', () => {
    expect(readEnv({ NODE_ENV: 'test' }).TRUSTED_PROXY_HOPS).toBe(0);
    expect(readEnv({ NODE_ENV: 'test', TRUSTED_PROXY_HOPS: '2' }).TRUSTED_PROXY_HOPS).toBe(2);
  });

  it.each(['-1', '1.5', 'yes', '11'])('refuses %j with a message naming the variable', (value) => {
    expect(() => readEnv({ NODE_ENV: 'test', TRUSTED_PROXY_HOPS: value })).toThrow(/TRUSTED_PROXY_HOPS/);
  });
});

// A real socket: Node's request-start channel stamps the address before any handler runs, whatever the client sends.
describe('the peer-address hook on a real HTTP server', () => {
  let server: http.Server;
  let port = 0;

  beforeAll(async () => {
    server = http.createServer((req, res) => {
      const headers = new Headers();
      for (const [name, value] of Object.entries(req.headers)) if (typeof value === 'string') headers.set(name, value);
      res.setHeader('content-type', 'application/json');
      res.end(JSON.stringify({ address: clientAddress(new Request('http://localhost/', { headers }), 0) }));
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    port = (server.address() as AddressInfo).port;
  });
  afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

  it('answers the socket address, not a forged X-Forwarded-For or peer header', async () => {
    const ask = async (headers: Record<string, string>) => ((await (await fetch(`http://127.0.0.1:${port}/`, { headers })).json()) as { address: string }).address;
    expect(await ask({})).toBe('127.0.0.1');
    expect(await ask({ 'x-forwarded-for': '203.0.113.99', [PEER_HEADER]: '203.0.113.98' })).toBe('127.0.0.1');
    const [name, stamp] = peerStampFor('203.0.113.97');
    expect(await ask({ [name]: stamp })).toBe('127.0.0.1');
  });
});
