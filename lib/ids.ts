// Record ids are UUIDs. One that is not even well formed never reaches a query: in a URL it is
// refused by name (lib/http/route-params.ts); in a data function it is simply not found.
import { z } from 'zod';
import { notFound } from '@/lib/errors';

const uuid = z.uuid();

export function isId(value: unknown): value is string {
  return typeof value === 'string' && uuid.safeParse(value).success;
}

export function assertId(id: string, what: string): void {
  if (!isId(id)) throw notFound(what);
}
