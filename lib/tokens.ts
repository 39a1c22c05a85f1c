// Single-use link tokens: 32 random bytes for the link, only their SHA-256 hash is stored.
import { createHash, randomBytes } from 'node:crypto';

export function newLinkToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

export function appUrl(pathAndQuery: string): string {
  const base = (process.env.ANTINODE_BASE_URL ?? 'http://localhost:3000').replace(/\/+$/, '');
  return `${base}${pathAndQuery}`;
}
