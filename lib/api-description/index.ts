// The API description: every operation of app/api/v1, by area, and the OpenAPI 3.1 document built
// from them. A new route needs its entry in one of the area files (the description test fails without).
import { publicOrigin } from '@/lib/http/same-origin';
import { ACCOUNT_OPERATIONS } from './account';
import { ANALYSIS_OPERATIONS } from './analysis';
import { buildApiDocument, type OpenApiDocument } from './build-document';
import { COMMENT_OPERATIONS } from './comments';
import { PLAN_OPERATIONS } from './plans';
import { REVISION_OPERATIONS } from './revisions';
import { SERVICE_OPERATIONS } from './service';
import { TEAM_OPERATIONS } from './team';
import type { ApiOperation } from './types';

export type { ApiArea, ApiOperation, HttpMethod } from './types';
export { API_AREAS } from './types';
export { curlExample, exampleUrl } from './curl';
export { operationId, type OpenApiDocument } from './build-document';

/** Raise when the API changes in a way a caller would notice. */
export const API_VERSION = '1.0.0';

export const API_OPERATIONS: readonly ApiOperation[] = [
  ...ANALYSIS_OPERATIONS, ...PLAN_OPERATIONS, ...REVISION_OPERATIONS, ...COMMENT_OPERATIONS, ...TEAM_OPERATIONS, ...ACCOUNT_OPERATIONS, ...SERVICE_OPERATIONS,
];

const built = new Map<string, OpenApiDocument>();

/** The document for the app at serverUrl; built once per address, since it changes only with a release. */
export function apiDocument(serverUrl = publicOrigin()): OpenApiDocument {
  let document = built.get(serverUrl);
  if (!document) {
    document = buildApiDocument(API_OPERATIONS, serverUrl, API_VERSION);
    built.set(serverUrl, document);
  }
  return document;
}
