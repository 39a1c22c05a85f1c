'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import type { TokenView } from '@/lib/auth/api-tokens';
import { ROLE_LABELS, type Role } from '@/lib/permissions';
import { Providers } from '@/components/providers';

interface TeamChoice {
  teamId: string;
  teamName: string;
  /** The roles a token in this team may take (no more than the person's own). */
  roles: Role[];
}

async function send<T>(url: string, init?: RequestInit): Promise<T> {
  const response = await fetch(url, { ...init, headers: { 'content-type': 'application/json', ...(init?.headers ?? {}) } });
  const body = await response.json().catch(() => null);
  if (!response.ok) throw new Error(body?.error?.message ?? `The server answered ${response.status}.`);
  return body as T;
}

const day = (iso: string | null) => (iso ? iso.slice(0, 10) : 'never');

function TokenList() {
  const client = useQueryClient();
  const tokens = useQuery({ queryKey: ['api-tokens'], queryFn: () => send<{ tokens: TokenView[] }>('/api/v1/me/tokens') });
  const revoke = useMutation({
    mutationFn: (id: string) => send<{ record: TokenView }>(`/api/v1/me/tokens/${id}`, { method: 'DELETE' }),
    onSuccess: () => client.invalidateQueries({ queryKey: ['api-tokens'] }),
  });
  if (tokens.isLoading) return <p className="text-sm text-graphite-500" role="status">Loading your tokens…</p>;
  if (tokens.error) return <p className="text-sm text-risk-ink" role="alert">{tokens.error.message}</p>;
  const list = tokens.data?.tokens ?? [];
  if (list.length === 0) return <p className="text-sm text-graphite-500">No tokens yet.</p>;
  const now = Date.now();
  return (
    <table className="w-full text-left text-sm" data-testid="api-token-list">
      <thead className="text-xs text-graphite-500"><tr><th className="py-1 pr-2 font-medium">Name</th><th className="pr-2 font-medium">Team and role</th><th className="pr-2 font-medium">Starts</th><th className="pr-2 font-medium">Expires</th><th className="pr-2 font-medium">Last used</th><th /></tr></thead>
      <tbody>
        {list.map((token) => {
          const state = token.revokedAt ? `revoked ${day(token.revokedAt)}` : Date.parse(token.expiresAt) <= now ? 'expired' : null;
          return (
            <tr key={token.id} className="border-t border-graphite-100 align-top" data-testid="api-token-row">
              <td className="py-1 pr-2">{token.name}</td>
              <td className="pr-2 text-xs">{token.teamName} · {ROLE_LABELS[token.role]}</td>
              <td className="num pr-2 text-xs">{token.prefix}…</td>
              <td className="num pr-2 text-xs">{day(token.expiresAt)}</td>
              <td className="num pr-2 text-xs">{day(token.lastUsedAt)}</td>
              <td className="py-1 text-right">
                {state ? <span className="text-xs text-graphite-500">{state}</span> : (
                  <button type="button" className="btn-quiet px-2 py-0.5 text-xs" disabled={revoke.isPending} onClick={() => revoke.mutate(token.id)}>Revoke</button>
                )}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

function CreateToken({ teams }: { teams: TeamChoice[] }) {
  const client = useQueryClient();
  const [teamId, setTeamId] = useState(teams[0]?.teamId ?? '');
  const team = teams.find((choice) => choice.teamId === teamId) ?? teams[0];
  const [role, setRole] = useState<Role>(team?.roles.at(-1) ?? 'viewer');
  const [name, setName] = useState('');
  const [days, setDays] = useState('90');
  const [shown, setShown] = useState<string | null>(null);
  const create = useMutation({
    mutationFn: () => send<{ token: string }>('/api/v1/me/tokens', { method: 'POST', body: JSON.stringify({ name, teamId, role, expiresInDays: Number(days) }) }),
    onSuccess: (answer) => { setShown(answer.token); setName(''); void client.invalidateQueries({ queryKey: ['api-tokens'] }); },
  });
  if (!team) return null;
  return (
    <form className="space-y-2" onSubmit={(event) => { event.preventDefault(); setShown(null); create.mutate(); }}>
      <div className="grid grid-cols-2 gap-2">
        <label className="text-xs font-medium text-graphite-700">Name<input className="field-input mt-0.5 py-1" value={name} onChange={(event) => setName(event.target.value)} placeholder="e.g. fan data script" /></label>
        <label className="text-xs font-medium text-graphite-700">Expires after (days)<input className="field-input num mt-0.5 py-1" inputMode="numeric" value={days} onChange={(event) => setDays(event.target.value)} /></label>
        <label className="text-xs font-medium text-graphite-700">Team
          <select className="field-input mt-0.5 py-1" value={team.teamId} onChange={(event) => { setTeamId(event.target.value); const next = teams.find((choice) => choice.teamId === event.target.value); if (next && !next.roles.includes(role)) setRole(next.roles.at(-1) ?? 'viewer'); }}>
            {teams.map((choice) => <option key={choice.teamId} value={choice.teamId}>{choice.teamName}</option>)}
          </select>
        </label>
        <label className="text-xs font-medium text-graphite-700">Role (no more than yours)
          <select className="field-input mt-0.5 py-1" value={role} onChange={(event) => setRole(event.target.value as Role)}>
            {team.roles.map((choice) => <option key={choice} value={choice}>{ROLE_LABELS[choice]}</option>)}
          </select>
        </label>
      </div>
      <button type="submit" className="btn-primary" disabled={create.isPending}>Create token</button>
      {create.error && <p role="alert" className="text-sm text-risk-ink">{create.error.message}</p>}
      {shown && (
        <div role="status" className="rounded border border-graphite-200 bg-paper-sunk p-2 text-sm" data-testid="api-token-shown">
          <p>Copy it now: it is shown only this once. Send it as <code>Authorization: Bearer …</code>.</p>
          <code className="num block break-all pt-1" data-testid="api-token-value">{shown}</code>
        </div>
      )}
    </form>
  );
}

// Personal API tokens on the account page: create one for a team with a role no higher than one's own,
// see it once, see when each was last used, revoke it.
export function ApiTokensSection({ teams }: { teams: TeamChoice[] }) {
  return (
    <section className="panel space-y-3 p-6" aria-labelledby="tokens-title">
      <h2 id="tokens-title" className="font-semibold">API tokens</h2>
      <p className="text-sm text-graphite-500">Scripts use a token to call the API as you, in one team, with the role you give it, until it expires or you revoke it. The <Link href="/account/api" className="underline">API reference</Link> lists every route with an example call.</p>
      <Providers>
        <CreateToken teams={teams} />
        <TokenList />
      </Providers>
    </section>
  );
}
