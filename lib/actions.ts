// Server actions return a result instead of throwing, so forms can show the message.
import { AppError, type ErrorBody } from './errors';

export type ActionResult<T> = { ok: true; data: T } | { ok: false; error: ErrorBody['error'] };

export async function runAction<T>(name: string, body: () => Promise<T>): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await body() };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, error: error.toBody().error };
    if (error instanceof RangeError) return { ok: false, error: { code: 'bad_input', message: error.message } };
    console.error(`[action ${name}] unexpected error`, error);
    return { ok: false, error: { code: 'internal', message: 'Something went wrong on the server. Nothing was changed; try again.' } };
  }
}
