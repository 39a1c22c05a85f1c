// Browsers that signed in to an account before. A successful sign-in (or a password reset from
// the mailed link) leaves a random token in a long-lived cookie, and only its hash is kept. When
// someone else's failed sign-ins slow an account or a network down, a browser holding that
// account's token is not slowed (OWASP, "Slow Down Online Guessing Attacks with Device Cookies");
// it still needs the password, and its own failures still count.
import { Op } from 'sequelize';
import { hashLinkToken, newLinkToken } from '@/lib/tokens';
import { KnownDevice } from '@/models';

export const DEVICE_COOKIE = 'antinode_device';
const DEVICE_DAYS = 365;
const DEVICES_PER_ACCOUNT = 10;

export interface PlainCookie {
  name: string;
  value: string;
  attributes: { httpOnly: true; sameSite: 'lax'; secure: boolean; path: '/'; maxAge: number };
}

export function serializeCookie(cookie: PlainCookie): string {
  const { attributes } = cookie;
  return [
    `${cookie.name}=${encodeURIComponent(cookie.value)}`, `Max-Age=${attributes.maxAge}`, `Path=${attributes.path}`,
    'HttpOnly', 'SameSite=Lax', ...(attributes.secure ? ['Secure'] : []),
  ].join('; ');
}

function deviceCookie(token: string): PlainCookie {
  return {
    name: DEVICE_COOKIE, value: token,
    attributes: { httpOnly: true, sameSite: 'lax', secure: process.env.NODE_ENV === 'production', path: '/', maxAge: DEVICE_DAYS * 86_400 },
  };
}

/** The device token from a Cookie header (route handlers). */
export function deviceTokenFromCookieHeader(header: string | null): string | null {
  for (const part of (header ?? '').split(';')) {
    const [name, ...rest] = part.trim().split('=');
    if (name === DEVICE_COOKIE) return decodeURIComponent(rest.join('=')) || null;
  }
  return null;
}

/** Whether the token belongs to a browser that signed in to this account (by e-mail) before. */
export async function isKnownDevice(userId: string | null, token: string | null): Promise<boolean> {
  if (!token || token.length > 200) return false;
  const row = await KnownDevice.findByPk(hashLinkToken(token)); // looked up for unknown addresses too: the same work
  return userId !== null && row?.userId === userId;
}

/** Remembers the browser for the account: the same token again if it already was, else a new one. */
export async function rememberDevice(userId: string, token: string | null, now = new Date()): Promise<PlainCookie> {
  if (token && (await isKnownDevice(userId, token))) {
    await KnownDevice.update({ lastUsedAt: now }, { where: { tokenHash: hashLinkToken(token) } });
    return deviceCookie(token);
  }
  const fresh = newLinkToken();
  await KnownDevice.create({ tokenHash: fresh.tokenHash, userId, createdAt: now, lastUsedAt: now });
  const kept = await KnownDevice.findAll({ where: { userId }, order: [['lastUsedAt', 'DESC']], offset: DEVICES_PER_ACCOUNT, attributes: ['tokenHash'] });
  if (kept.length > 0) await KnownDevice.destroy({ where: { tokenHash: { [Op.in]: kept.map((row) => row.tokenHash) } } });
  return deviceCookie(fresh.token);
}
