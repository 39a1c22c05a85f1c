// Reading the client's address from the peer and X-Forwarded-For. The right-to-left walk that
// stops at the first address not a trusted proxy: MDN, "X-Forwarded-For" (Security and privacy
// concerns: "the rightmost IP address that is not a trusted proxy"); keying IPv6 clients by
// their /64 network is common practice, no source.
import { describe, expect, it } from 'vitest';
import { addressKey, parseTrustedProxies, resolveClientAddress } from '@/lib/http/client-address';

const none = parseTrustedProxies(undefined);
const proxies = parseTrustedProxies('10.0.0.0/8, 192.168.1.5, fd00::/8');

describe('resolveClientAddress', () => {
  it('trusts no forwarding header by default: the peer is the client', () => {
    expect(resolveClientAddress('203.0.113.9', '1.2.3.4', none)).toBe('203.0.113.9');
    expect(resolveClientAddress('::ffff:203.0.113.9', null, none)).toBe('203.0.113.9');
  });

  it('behind trusted proxies, takes the rightmost address that is not one of them', () => {
    expect(resolveClientAddress('10.0.0.2', '203.0.113.9', proxies)).toBe('203.0.113.9');
    expect(resolveClientAddress('10.0.0.2', '198.51.100.1, 203.0.113.9, 192.168.1.5', proxies)).toBe('203.0.113.9');
    // The leftmost entries are whatever the client wrote: never taken.
    expect(resolveClientAddress('10.0.0.2', '1.1.1.1, 2.2.2.2, 203.0.113.9', proxies)).toBe('203.0.113.9');
    expect(resolveClientAddress('fd00::1', '2001:db8::7', proxies)).toBe('2001:db8::7');
  });

  it('stops at a hop it cannot read, and falls back to the last proxy when the chain is all proxies', () => {
    expect(resolveClientAddress('10.0.0.2', 'not-an-address, 203.0.113.9', proxies)).toBe('203.0.113.9');
    expect(resolveClientAddress('10.0.0.2', '203.0.113.9, garbage', proxies)).toBe('10.0.0.2');
    expect(resolveClientAddress('10.0.0.2', '10.0.0.3', proxies)).toBe('10.0.0.3');
    expect(resolveClientAddress('10.0.0.2', null, proxies)).toBe('10.0.0.2');
  });

  it('without a peer (not served by scripts/serve.mjs) the address is unknown', () => {
    expect(resolveClientAddress(null, '203.0.113.9', proxies)).toBeNull();
  });

  it('refuses a setting that is not an address or range, naming it', () => {
    expect(() => parseTrustedProxies('10.0.0.0/8, proxy.internal')).toThrow('"proxy.internal" is not an IP address or CIDR range');
    expect(() => parseTrustedProxies('10.0.0.0/33')).toThrow('prefix length out of range');
  });
});

describe('addressKey', () => {
  it('an IPv4 address is its own key; an IPv6 address counts by its /64', () => {
    expect(addressKey('203.0.113.9')).toBe('203.0.113.9');
    expect(addressKey('2001:db8:1:2:aaaa::1')).toBe('2001:db8:1:2::/64');
    expect(addressKey('2001:db8:1:2:bbbb:cccc:dddd:eeee')).toBe('2001:db8:1:2::/64');
    expect(addressKey('2001:db8::1')).toBe('2001:db8:0:0::/64');
    expect(addressKey(null)).toBe('unknown');
  });
});
