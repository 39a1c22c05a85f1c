// Assembles the OpenAPI 3.1 document from the operations (lib/api-description/*.ts): each path and
// method with its permission, parameters, body schema and example (zod → JSON Schema 2020-12), its
// answers, and the refusals it can meet in the one error shape.
import { curlExample } from './curl';
import { errorBodySchema, REFUSALS } from './error-body';
import { handQueryParameters, jsonSchemaOf, pathParameterNames, queryParametersOf, type DefinitionSink } from './json-schema';
import { API_AREAS, type ApiOperation, type ApiResponse, type JsonSchema } from './types';

export type OpenApiDocument = {
  openapi: '3.1.0';
  info: { title: string; version: string; description: string };
  servers: { url: string }[];
  tags: { name: string }[];
  paths: Record<string, Record<string, JsonSchema>>;
  components: { schemas: Record<string, JsonSchema>; securitySchemes: Record<string, JsonSchema>; responses: Record<string, JsonSchema> };
};

const ERROR_REF = { $ref: '#/components/schemas/ErrorBody' };
const COMMON_REFUSALS = [400, 401, 403, 404, 413, 415, 500, 503] as const;

const DESCRIPTION = [
  'Antinode\'s JSON API. Every request is answered as JSON unless the operation says otherwise (PDF, CSV, images).',
  '',
  '**Signing in.** A script sends a personal API token, made on the account page, as `Authorization: Bearer ant_…`: it acts as its person in one team with the role given to it. A browser uses the `antinode_session` cookie set by signing in. Both meet the same permission map, rate limits and audit log; managing tokens takes a session.',
  '',
  '**Errors** all have one shape, `{ "error": { "code", "message", "field"? } }`, with the status of the code: bad_input 400, not_signed_in 401, forbidden 403, not_found 404, conflict 409, too_large 413, unsupported_media_type 415, too_much_work 422, throttled 429 (with Retry-After), internal 500, busy 503.',
  '',
  '**Bodies** are JSON (`Content-Type: application/json`) under each operation\'s size limit (`x-max-body-bytes`; 256 KB unless stated); a key the schema does not know is refused, naming it. Units are SI, named in the field (lengthM, frequencyHz, temperatureC). Ids in URLs are UUIDs.',
].join('\n');

function responseContent(response: ApiResponse, sink: DefinitionSink): JsonSchema | undefined {
  const type = response.contentType ?? 'application/json';
  if (type !== 'application/json') return { [type]: { schema: { type: 'string', contentMediaType: type } } };
  const schema = response.schema
    ? jsonSchemaOf(response.schema, sink)
    : { type: 'object', properties: Object.fromEntries(Object.entries(response.fields ?? {}).map(([name, description]) => [name, { description }])) };
  return { 'application/json': { schema, ...(response.example === undefined ? {} : { example: response.example }) } };
}

/** The refusals an operation can meet: from its inputs, its access, and what it lists itself. */
export function refusalsOf(operation: ApiOperation): Record<string, JsonSchema> {
  const hasInput = operation.body.kind !== 'none' || operation.query !== undefined || pathParameterNames(operation.path).length > 0;
  const applies: Record<(typeof COMMON_REFUSALS)[number], boolean> = {
    400: hasInput || operation.access !== 'public',
    401: operation.access !== 'public',
    403: (operation.access !== 'public' && operation.access !== 'signed-in') || operation.sessionOnly === true || operation.method !== 'GET',
    404: pathParameterNames(operation.path).length > 0,
    413: operation.body.kind !== 'none',
    415: operation.body.kind === 'json',
    500: true,
    503: true,
  };
  const refusals: Record<string, JsonSchema> = {};
  for (const status of COMMON_REFUSALS) if (applies[status]) refusals[String(status)] = { $ref: `#/components/responses/Refusal${status}` };
  const specific = { ...(operation.rateLimited ? { 429: REFUSALS[429].description } : {}), ...operation.refusals };
  for (const [status, description] of Object.entries(specific)) {
    refusals[status] = { description, content: { 'application/json': { schema: ERROR_REF, example: REFUSALS[Number(status)].example } } };
  }
  return refusals;
}

function requestBodyOf(operation: ApiOperation, sink: DefinitionSink): JsonSchema | undefined {
  const body = operation.body;
  if (body.kind === 'json') return { required: true, content: { 'application/json': { schema: jsonSchemaOf(body.schema, sink), examples: { example: { summary: body.exampleSummary, value: body.example } } } } };
  if (body.kind === 'form') {
    return { required: true, content: { 'multipart/form-data': { schema: { type: 'object', properties: { [body.field]: { type: 'string', contentMediaType: 'application/octet-stream', description: body.description } }, required: [body.field] } } } };
  }
  if (body.kind === 'text') return { required: true, description: body.description, content: { 'application/json': { schema: { type: 'object' } } } };
  return undefined;
}

function parametersOf(operation: ApiOperation): JsonSchema[] {
  const pathParameters = pathParameterNames(operation.path).map((name) => ({
    name, in: 'path', required: true, schema: { type: 'string', format: 'uuid' }, ...(operation.pathExample?.[name] ? { example: operation.pathExample[name] } : {}),
  }));
  const query = operation.query;
  const queryParameters = !query ? [] : 'schema' in query ? queryParametersOf(query.schema) : handQueryParameters(query.parameters);
  const header = operation.body.kind === 'text' ? [{ name: operation.body.header.name, in: 'header', required: true, description: operation.body.header.description, schema: { type: 'string' } }] : [];
  return [...pathParameters, ...queryParameters, ...header];
}

export function operationId(operation: ApiOperation): string {
  const words = operation.path.replace(/^\/api\/v1\//, '').split(/[/{}.-]+/).filter(Boolean);
  return operation.method.toLowerCase() + words.map((word) => word[0].toUpperCase() + word.slice(1)).join('');
}

function operationObject(operation: ApiOperation, serverUrl: string, schemas: Record<string, JsonSchema>): JsonSchema {
  const sink: DefinitionSink = { schemas, prefix: operationId(operation) };
  const security = operation.access === 'public' ? [] : operation.sessionOnly ? [{ sessionCookie: [] }] : [{ bearerToken: [] }, { sessionCookie: [] }];
  const successes = Object.fromEntries(Object.entries(operation.responses).map(([status, response]) => [status, { description: response.description, content: responseContent(response, sink) }]));
  const parameters = parametersOf(operation);
  const requestBody = requestBodyOf(operation, sink);
  return {
    operationId: operationId(operation),
    tags: [operation.area],
    summary: operation.summary,
    ...(operation.description ? { description: operation.description } : {}),
    security,
    ...(parameters.length > 0 ? { parameters } : {}),
    ...(requestBody ? { requestBody } : {}),
    responses: { ...successes, ...refusalsOf(operation) },
    'x-permission': operation.access,
    ...(operation.rateLimited ? { 'x-rate-limit': 'analysis' } : {}),
    ...(operation.body.kind !== 'none' ? { 'x-max-body-bytes': operation.maxBodyBytes ?? 256 * 1024 } : {}),
    'x-codeSamples': [{ lang: 'Shell', label: 'curl', source: curlExample(operation, serverUrl) }],
  };
}

export function buildApiDocument(operations: readonly ApiOperation[], serverUrl: string, version: string): OpenApiDocument {
  const paths: OpenApiDocument['paths'] = {};
  const schemas: Record<string, JsonSchema> = { ErrorBody: jsonSchemaOf(errorBodySchema) };
  for (const operation of operations) {
    const item = (paths[operation.path] ??= {});
    const method = operation.method.toLowerCase();
    if (item[method]) throw new Error(`The API description lists ${operation.method} ${operation.path} twice.`);
    item[method] = operationObject(operation, serverUrl, schemas);
  }
  const responses = Object.fromEntries(COMMON_REFUSALS.map((status) => [`Refusal${status}`, {
    description: REFUSALS[status].description,
    content: { 'application/json': { schema: ERROR_REF, example: REFUSALS[status].example } },
  }]));
  return {
    openapi: '3.1.0',
    info: { title: 'Antinode API', version, description: DESCRIPTION },
    servers: [{ url: serverUrl }],
    tags: API_AREAS.map((name) => ({ name })),
    paths,
    components: {
      schemas,
      securitySchemes: {
        bearerToken: { type: 'http', scheme: 'bearer', description: 'A personal API token from the account page ("ant_" and 43 characters): Authorization: Bearer <token>. It acts in one team with the role given to it.' },
        sessionCookie: { type: 'apiKey', in: 'cookie', name: 'antinode_session', description: 'The session cookie a browser gets by signing in (POST /api/v1/sessions for a script).' },
      },
      responses,
    },
  };
}
