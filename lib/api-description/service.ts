// The service itself: health, readiness, and this description.
import type { ApiOperation } from './types';

export const SERVICE_OPERATIONS: ApiOperation[] = [
  {
    method: 'GET', path: '/api/v1/health', area: 'Service', access: 'public', summary: 'Does the process answer?',
    body: { kind: 'none' },
    responses: { 200: { description: 'The process answers and its database connection works (503 with status "degraded" when not).', fields: { status: 'ok or degraded', database: '{ ok, latencyMs, message? }' } } },
  },
  {
    method: 'GET', path: '/api/v1/ready', area: 'Service', access: 'public', summary: 'Is this instance ready to serve? (for a load balancer)',
    body: { kind: 'none' },
    responses: { 200: { description: 'Ready: the database and the file store both answered within 2 s (503 naming the one that did not).', fields: { status: 'ready or not ready', database: '{ ok, latencyMs, message? }', store: '{ ok, latencyMs, message? }' } } },
  },
  {
    method: 'GET', path: '/api/v1/openapi.json', area: 'Service', access: 'public', summary: 'This API description (OpenAPI 3.1)',
    body: { kind: 'none' },
    responses: { 200: { description: 'The OpenAPI 3.1 document, generated from the zod schemas the routes parse with.', fields: { openapi: '"3.1.0"', info: 'Title, version, description', paths: 'Every route and method', components: 'Error shape and the two ways to sign in' } } },
  },
];
