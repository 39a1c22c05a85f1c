// Typed errors, turned into one wire shape at the edge: { error: { code, message, field? } }.

export const ERROR_STATUS = {
  bad_input: 400,
  not_signed_in: 401,
  wrong_credentials: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  unsupported_media_type: 415,
  too_much_work: 422,
  throttled: 429,
  internal: 500,
  busy: 503,
} as const;
export type ErrorCode = keyof typeof ERROR_STATUS;

export interface ErrorBody {
  error: { code: ErrorCode; message: string; field?: string; retryAfterS?: number };
}

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly field?: string;
  readonly retryAfterS?: number;

  constructor(code: ErrorCode, message: string, options: { field?: string; retryAfterS?: number } = {}) {
    super(message);
    this.name = 'AppError';
    this.code = code;
    this.field = options.field;
    this.retryAfterS = options.retryAfterS;
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }

  toBody(): ErrorBody {
    const body: ErrorBody = { error: { code: this.code, message: this.message } };
    if (this.field) body.error.field = this.field;
    if (this.retryAfterS !== undefined) body.error.retryAfterS = this.retryAfterS;
    return body;
  }
}

export const notSignedIn = () => new AppError('not_signed_in', 'Sign in to continue.');
export const forbidden = (what = 'do that') => new AppError('forbidden', `Your role in this team may not ${what}.`);
export const notFound = (what = 'That item') => new AppError('not_found', `${what} was not found.`);
