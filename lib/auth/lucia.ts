import { Lucia, TimeSpan } from 'lucia';
import type { UnitSystem } from '@/models/user';
import { sequelizeSessionAdapter } from './adapter';

export const SESSION_COOKIE = 'antinode_session';

export const lucia = new Lucia(sequelizeSessionAdapter, {
  sessionExpiresIn: new TimeSpan(30, 'd'),
  sessionCookie: {
    name: SESSION_COOKIE,
    // The cookie lives as long as the session (30 days, renewed with it), not lucia's 400-day default.
    expires: true,
    attributes: { secure: process.env.NODE_ENV === 'production', sameSite: 'lax' },
  },
  getUserAttributes: (attributes) => ({ email: attributes.email, name: attributes.name, unitSystem: attributes.unitSystem }),
  getSessionAttributes: (attributes) => ({ activeTeamId: attributes.activeTeamId }),
});

declare module 'lucia' {
  interface Register {
    Lucia: typeof lucia;
    UserId: string;
    DatabaseUserAttributes: { email: string; name: string; unitSystem: UnitSystem };
    DatabaseSessionAttributes: { activeTeamId: string | null };
  }
}
