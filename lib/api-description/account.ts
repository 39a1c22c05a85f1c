// The person: who they are, preferences, API tokens, sessions, sign-up, password resets, invitations.
import { passwordResetRequestSchema, passwordResetSchema } from '@/lib/account/schemas';
import { createTokenSchema } from '@/lib/auth/api-tokens';
import { signInSchema, signUpConfirmSchema, signUpSchema, switchTeamSchema } from '@/lib/auth/schemas';
import { acceptInvitationSchema } from '@/lib/team/schemas';
import { preferencesSchema } from '@/lib/users/preferences';
import { EXAMPLE_IDS } from './examples';
import type { ApiOperation } from './types';

const AREA = 'Account and sign-in';
const TOKEN_FIELDS = 'id, name, teamId, teamName, role, prefix, expiresAt, lastUsedAt, revokedAt, createdAt';
const SESSION_COOKIE = 'Sets the antinode_session cookie (30 days) and the device cookie that lets this client through when others\' failed sign-ins slow the account down.';
const LINK = 'The token from the mailed link';

export const ACCOUNT_OPERATIONS: ApiOperation[] = [
  {
    method: 'GET', path: '/api/v1/me', area: AREA, access: 'signed-in', summary: 'Who is asking, their teams and what they may do',
    body: { kind: 'none' },
    responses: { 200: { description: 'The person.', fields: { user: 'id, name, email, unitSystem', teams: 'Each membership: teamId, teamName, role', activeTeam: 'The team this session or token works in', allowedActions: 'The actions of the permission map the role allows there' } } },
  },
  {
    method: 'PUT', path: '/api/v1/me/preferences', area: AREA, access: 'signed-in', maxBodyBytes: 1024, summary: 'Choose SI or imperial units for display',
    body: { kind: 'json', schema: preferencesSchema, example: { unitSystem: 'imperial' }, exampleSummary: 'Show feet and inches' },
    responses: { 200: { description: 'Saved.', fields: { preferences: 'unitSystem' } } },
  },
  {
    method: 'GET', path: '/api/v1/me/tokens', area: AREA, access: 'signed-in', sessionOnly: true, summary: 'List your API tokens (never the tokens themselves)',
    body: { kind: 'none' },
    responses: { 200: { description: 'The tokens.', fields: { tokens: `Each: ${TOKEN_FIELDS}` } } },
  },
  {
    method: 'POST', path: '/api/v1/me/tokens', area: AREA, access: 'signed-in', sessionOnly: true, maxBodyBytes: 4 * 1024, summary: 'Create an API token',
    description: 'For one team, with a role whose permissions are within yours there, for 1 to 365 days. The answer shows the token once; only its hash is kept.',
    body: { kind: 'json', schema: createTokenSchema, example: { name: 'fan data script', teamId: EXAMPLE_IDS.teamId, role: 'engineer', expiresInDays: 90 }, exampleSummary: 'A token for a script that analyses runs' },
    responses: { 201: { description: 'The token, shown this once.', fields: { token: '"ant_" and 43 characters: send it as Authorization: Bearer <token>', record: TOKEN_FIELDS } } },
    refusals: { 409: 'Too many live tokens (20).' },
  },
  {
    method: 'DELETE', path: '/api/v1/me/tokens/{tokenId}', area: AREA, access: 'signed-in', sessionOnly: true, summary: 'Revoke an API token',
    pathExample: { tokenId: EXAMPLE_IDS.tokenId }, body: { kind: 'none' },
    responses: { 200: { description: 'Revoked: every later use gets a 401 that says so.', fields: { record: TOKEN_FIELDS } } },
  },
  {
    method: 'POST', path: '/api/v1/sessions', area: AREA, access: 'public', maxBodyBytes: 4096, summary: 'Sign in (for scripts that use a session rather than a token)',
    description: SESSION_COOKIE,
    body: { kind: 'json', schema: signInSchema, example: { email: 'acoustician@antinode.test', password: 'antinode-demo' }, exampleSummary: 'The demo acoustician' },
    responses: { 201: { description: 'Signed in.', fields: { signedIn: 'true' } } },
    refusals: { 429: 'Too many failed sign-ins; Retry-After says how long to wait.' },
  },
  {
    method: 'PUT', path: '/api/v1/sessions/current', area: AREA, access: 'signed-in', maxBodyBytes: 1024, summary: 'Switch the team this session works in',
    body: { kind: 'json', schema: switchTeamSchema, example: { teamId: EXAMPLE_IDS.teamId }, exampleSummary: 'Another of your teams' },
    responses: { 200: { description: 'Switched.', fields: { activeTeamId: 'The team now active' } } },
  },
  {
    method: 'DELETE', path: '/api/v1/sessions/current', area: AREA, access: 'signed-in', summary: 'Sign out',
    body: { kind: 'none' },
    responses: { 200: { description: 'Signed out; the cookie is cleared.', fields: { signedIn: 'false' } } },
  },
  {
    method: 'POST', path: '/api/v1/sign-ups', area: AREA, access: 'public', maxBodyBytes: 4096, summary: 'Ask for an account',
    description: 'The same answer for every address, before anything is looked up; the mail follows (a confirmation link, or a notice to an address that already has an account).',
    body: { kind: 'json', schema: signUpSchema, example: { name: 'Ada Byrne', email: 'ada.byrne@example.test', password: 'a long enough password', teamName: 'Byrne Acoustics' }, exampleSummary: 'A new person and their team' },
    responses: { 202: { description: 'Asked for.', fields: { message: 'Check the inbox of …' } } },
    refusals: { 429: 'More than 10 sign-ups an hour from this address.' },
  },
  {
    method: 'POST', path: '/api/v1/sign-ups/confirm', area: AREA, access: 'public', maxBodyBytes: 1024, summary: 'Confirm a sign-up from the mailed link',
    description: `Creates the account and its team, and signs in. ${SESSION_COOKIE}`,
    body: { kind: 'json', schema: signUpConfirmSchema, example: { token: 'Yc3q9x0KzR2mVbT8pWs1nLh4dFj6gQe5uA7oIyE0rNk' }, exampleSummary: LINK },
    responses: { 201: { description: 'Signed up and in.', fields: { signedUp: 'true' } } },
  },
  {
    method: 'POST', path: '/api/v1/password-resets', area: AREA, access: 'public', maxBodyBytes: 1024, summary: 'Ask for a password reset link',
    description: 'The same answer at once whether or not the address has an account; the mail follows.',
    body: { kind: 'json', schema: passwordResetRequestSchema, example: { email: 'acoustician@antinode.test' }, exampleSummary: 'A forgotten password' },
    responses: { 202: { description: 'Asked for.', fields: { message: 'If the address has an account, a link is on its way' } } },
    refusals: { 429: 'More than 20 requests an hour from this address.' },
  },
  {
    method: 'POST', path: '/api/v1/password-resets/complete', area: AREA, access: 'public', maxBodyBytes: 1024, summary: 'Set a new password from the mailed link',
    description: 'Ends every session of the account.',
    body: { kind: 'json', schema: passwordResetSchema, example: { token: 'Pq8wE2rT5yU1iO4pA7sD0fG3hJ6kL9zX2cV5bN8mQ1w', password: 'a new long password' }, exampleSummary: LINK },
    responses: { 200: { description: 'Changed.', fields: { passwordChanged: 'true' } } },
  },
  {
    method: 'POST', path: '/api/v1/invitations/accept', area: AREA, access: 'public', maxBodyBytes: 4096, summary: 'Accept an invitation to a team',
    description: `A new person gives a name and a password; someone with an account gives their password, or is signed in as the invited address. ${SESSION_COOKIE}`,
    body: { kind: 'json', schema: acceptInvitationSchema, example: { token: 'Mn4bV7cX0zL3kJ6hG9fD2sA5pO8iU1yT4rE7wQ0aS3d', name: 'Ada Byrne', password: 'a long enough password' }, exampleSummary: 'A new person joins' },
    responses: { 201: { description: 'Joined, with a session in the team.', fields: { joined: '{ teamId }' } } },
    refusals: { 409: 'The link was withdrawn, has expired or was used.', 429: 'Too many failed password checks.' },
  },
];
