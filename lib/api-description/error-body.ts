// The one error shape every route answers with (lib/errors.ts), as a zod schema for the API description.
import { z } from 'zod';
import { ERROR_STATUS, type ErrorCode } from '@/lib/errors';

const ERROR_CODES = Object.keys(ERROR_STATUS) as [ErrorCode, ...ErrorCode[]];

export const errorBodySchema = z.object({
  error: z.object({
    code: z.enum(ERROR_CODES).describe('What kind of refusal; each code has one HTTP status'),
    message: z.string().min(1).describe('What was wrong and what to do, in words to show a person'),
    field: z.string().optional().describe('The field, query parameter or URL segment at fault, when one is'),
    retryAfterS: z.number().optional().describe('Seconds to wait before trying again (also in the Retry-After header)'),
  }),
}).describe('{ error: { code, message, field? } }: the body of every 4xx and 5xx answer.');

/** The status of each refusal the description lists, with the code it carries and an example. */
export const REFUSALS: Record<number, { code: ErrorCode; description: string; example: z.infer<typeof errorBodySchema> }> = {
  400: { code: 'bad_input', description: 'Bad input: a field, a query parameter or an id in the URL is wrong, or a key the schema does not know was sent; `field` names it.', example: { error: { code: 'bad_input', message: 'segments[2].lengthM must be > 0', field: 'segments[2].lengthM' } } },
  401: { code: 'not_signed_in', description: 'No session and no API token, or a token that is revoked, expired or unknown (the message says which).', example: { error: { code: 'not_signed_in', message: 'Sign in to continue.' } } },
  403: { code: 'forbidden', description: 'The role may not do this, the team is read-only while a payment is overdue, a write came from another site, or an API token was used where only a session may act.', example: { error: { code: 'forbidden', message: 'Your role in this team may not do that.' } } },
  404: { code: 'not_found', description: 'No such record in the active team.', example: { error: { code: 'not_found', message: 'That plan was not found.' } } },
  409: { code: 'conflict', description: 'Conflict.', example: { error: { code: 'conflict', message: 'Someone saved this plan after you opened it (now version 8, yours is 7). Your edits are kept: reload their version or overwrite it with yours.' } } },
  413: { code: 'too_large', description: 'The body is over the route\'s limit.', example: { error: { code: 'too_large', message: 'The request body is over 256 KB.' } } },
  415: { code: 'unsupported_media_type', description: 'The body was not sent as application/json.', example: { error: { code: 'unsupported_media_type', message: 'Send the body as JSON, with the header Content-Type: application/json.' } } },
  422: { code: 'too_much_work', description: 'Too much work.', example: { error: { code: 'too_much_work', message: 'This needs more than the 5 s one analysis may take, so it was stopped. Reduce the run\'s length, its number of segments, or its frequency range (maxHz) and try again.' } } },
  429: { code: 'throttled', description: 'Too many requests; wait as Retry-After says.', example: { error: { code: 'throttled', message: 'You have started more than 120 analyses in a minute; try again in 20 s.', retryAfterS: 20 } } },
  500: { code: 'internal', description: 'Something went wrong on the server; nothing was changed.', example: { error: { code: 'internal', message: 'Something went wrong on the server. Nothing was changed; try again.' } } },
  503: { code: 'busy', description: 'The server is busy or cannot reach its database just now; try again after Retry-After.', example: { error: { code: 'busy', message: 'The server cannot reach its database just now; it may be restarting. Try again in a few seconds.', retryAfterS: 5 } } },
};
