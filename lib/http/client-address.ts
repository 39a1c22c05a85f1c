// The address a request came from, for per-address budgets (sign-in, sign-up, password resets).
//
// The app is served by scripts/serve.mjs, which writes the connection's own peer address into
// PEER_HEADER on every request (overwriting whatever a client sent under that name). A client's
// X-Forwarded-For is believed only when that peer is a proxy named in ANTINODE_TRUSTED_PROXIES
// (addresses or CIDR ranges, comma-separated; default none): the chain is then read from the
// right, skipping trusted proxies, and the first other address is the client. Anything to its
// left was written by the client and is ignored, so a made-up header never buys a fresh budget.
import { BlockList, isIP } from 'node:net';

export const PEER_HEADER = 'x-antinode-peer';

/** Stands in for the address when the server did not say (next dev, a handler called directly). */
export const UNKNOWN_ADDRESS = 'unknown';

function normalise(address: string): string | null {
  let value = address.trim();
  if (value.startsWith('[') && value.includes(']')) value = value.slice(1, value.indexOf(']')); // [v6]:port
  else if (/^\d+\.\d+\.\d+\.\d+:\d+$/.test(value)) value = value.slice(0, value.lastIndexOf(':')); // v4:port
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(value);
  if (mapped) value = mapped[1];
  return isIP(value) ? value.toLowerCase() : null;
}

export function parseTrustedProxies(setting: string | undefined): BlockList {
  const list = new BlockList();
  for (const entry of (setting ?? '').split(',').map((part) => part.trim()).filter(Boolean)) {
    const [rawAddress, rawPrefix] = entry.split('/');
    const address = normalise(rawAddress);
    if (!address) throw new Error(`ANTINODE_TRUSTED_PROXIES: "${entry}" is not an IP address or CIDR range.`);
    const type = isIP(address) === 6 ? 'ipv6' : 'ipv4';
    if (rawPrefix === undefined) list.addAddress(address, type);
    else {
      const prefix = Number(rawPrefix);
      if (!Number.isInteger(prefix) || prefix < 0 || prefix > (type === 'ipv6' ? 128 : 32)) {
        throw new Error(`ANTINODE_TRUSTED_PROXIES: "${entry}" has a prefix length out of range.`);
      }
      list.addSubnet(address, prefix, type);
    }
  }
  return list;
}

function isTrusted(address: string, trusted: BlockList): boolean {
  return trusted.check(address, isIP(address) === 6 ? 'ipv6' : 'ipv4');
}

/** The client's address from the peer and X-Forwarded-For, trusting only the given proxies. */
export function resolveClientAddress(peer: string | null, forwardedFor: string | null, trusted: BlockList): string | null {
  const peerAddress = peer ? normalise(peer) : null;
  if (!peerAddress) return null;
  if (!isTrusted(peerAddress, trusted)) return peerAddress;
  const chain = (forwardedFor ?? '').split(',').map((part) => part.trim()).filter(Boolean);
  let client = peerAddress;
  for (let index = chain.length - 1; index >= 0; index -= 1) {
    const hop = normalise(chain[index]);
    if (!hop) break; // a trusted proxy never writes this: stop at the last address we can stand behind
    client = hop;
    if (!isTrusted(hop, trusted)) break;
  }
  return client;
}

/**
 * The key a per-address budget counts under: the address itself for IPv4, its /64 network for
 * IPv6 (one subscriber usually holds a whole /64; common practice, no source).
 */
export function addressKey(address: string | null): string {
  if (!address) return UNKNOWN_ADDRESS;
  if (isIP(address) !== 6) return address;
  const groups = expandIpv6(address).slice(0, 4);
  return `${groups.join(':')}::/64`;
}

function expandIpv6(address: string): string[] {
  const [head, tail = ''] = address.split('::');
  const headParts = head ? head.split(':') : [];
  const tailParts = tail ? tail.split(':') : [];
  if (tailParts.some((part) => part.includes('.'))) tailParts.splice(-1, 1, '0', '0'); // embedded v4 lies past the /64
  const missing = address.includes('::') ? 8 - headParts.length - tailParts.length : 0;
  return [...headParts, ...Array<string>(missing).fill('0'), ...tailParts].map((part) => (part || '0').replace(/^0+(?=.)/, ''));
}

let trustedFromEnvironment: { setting: string | undefined; list: BlockList } | null = null;

function trustedProxies(): BlockList {
  const setting = process.env.ANTINODE_TRUSTED_PROXIES;
  if (!trustedFromEnvironment || trustedFromEnvironment.setting !== setting) {
    trustedFromEnvironment = { setting, list: parseTrustedProxies(setting) };
  }
  return trustedFromEnvironment.list;
}

/** The client's address for a request's headers (route handlers: request.headers; actions: headers()). */
export function clientAddressOf(headers: Pick<Headers, 'get'>): string | null {
  return resolveClientAddress(headers.get(PEER_HEADER), headers.get('x-forwarded-for'), trustedProxies());
}
