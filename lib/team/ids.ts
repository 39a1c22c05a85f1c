import { z } from 'zod';
import { notFound } from '@/lib/errors';

const uuid = z.uuid();

// An id from a URL that is not even well formed is simply not found.
export function assertId(id: string, what: string): void {
  if (!uuid.safeParse(id).success) throw notFound(what);
}
