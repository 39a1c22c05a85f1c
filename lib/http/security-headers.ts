// The security headers of every answer: pages get them from proxy.ts (with a fresh script nonce
// per request), API answers from the route wrapper, static files from next.config.mjs. What each
// header does is in its browser documentation (MDN); the values are the strict ones a security
// scanner expects (OWASP Secure Headers Project, OWASP HTTP Headers Cheat Sheet).
import { appUrl } from '@/lib/tokens';

function servedOverHttps(): boolean {
  return appUrl('/').startsWith('https:');
}

const COMMON: Record<string, string> = {
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'same-origin',
  'Permissions-Policy': 'camera=(), microphone=(), geolocation=(), payment=(), usb=()',
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Resource-Policy': 'same-origin',
};

function transportHeaders(): Record<string, string> {
  return servedOverHttps() ? { 'Strict-Transport-Security': 'max-age=31536000; includeSubDomains' } : {};
}

/**
 * A page's policy: scripts only with this request's nonce (and what they load: 'strict-dynamic'),
 * everything else from this origin; never framed by another page. Styles allow inline style
 * attributes, which React and the canvas set. Next's development server also needs eval.
 */
export function pageContentSecurityPolicy(nonce: string, development = process.env.NODE_ENV === 'development'): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ''}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "frame-src 'self'",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(servedOverHttps() ? ['upgrade-insecure-requests'] : []),
  ].join('; ');
}

export function pageSecurityHeaders(nonce: string): Record<string, string> {
  return { ...COMMON, ...transportHeaders(), 'Content-Security-Policy': pageContentSecurityPolicy(nonce), 'X-Frame-Options': 'DENY' };
}

/**
 * An API answer. JSON is data, never a document: it may load nothing and be framed by nothing.
 * Files (a schedule PDF, a drawing, CSV) may be shown in a frame of our own pages only, and get
 * no further policy so the browser's own viewer can draw them.
 */
export function apiSecurityHeaders(contentType: string | null): Record<string, string> {
  const isJson = !contentType || /^application\/(.+\+)?json\b/i.test(contentType);
  return isJson
    ? { ...COMMON, ...transportHeaders(), 'Content-Security-Policy': "default-src 'none'; frame-ancestors 'none'", 'X-Frame-Options': 'DENY' }
    : { ...COMMON, ...transportHeaders(), 'Content-Security-Policy': "frame-ancestors 'self'", 'X-Frame-Options': 'SAMEORIGIN' };
}

/** Sets the API headers on an answer, keeping any a handler chose itself. */
export function withApiSecurityHeaders(response: Response): Response {
  for (const [name, value] of Object.entries(apiSecurityHeaders(response.headers.get('content-type')))) {
    if (!response.headers.has(name)) response.headers.set(name, value);
  }
  return response;
}
