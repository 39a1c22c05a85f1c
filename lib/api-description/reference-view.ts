// What the reference page shows of each operation, read from the OpenAPI document (so the page and
// the JSON say the same): parameters and body fields as table rows, answers and refusals, the example.
import { operationId, type OpenApiDocument } from './build-document';
import { curlExample } from './curl';
import { REFUSALS } from './error-body';
import { fieldRows, limitWords, resolverOf, typeWords, type FieldRow } from './field-rows';
import { API_AREAS, type ApiArea, type ApiOperation, type JsonSchema } from './types';

export interface AnswerView { status: string; description: string; fields: [string, string][] }

export interface OperationView {
  operation: ApiOperation;
  anchor: string;
  parameters: FieldRow[];
  bodyFields: FieldRow[];
  answers: AnswerView[];
  curl: string;
}

function answersOf(operation: ApiOperation, described: JsonSchema): AnswerView[] {
  const responses = described.responses as Record<string, JsonSchema>;
  return Object.entries(responses).map(([status, response]) => {
    const success = operation.responses[Number(status) as 200 | 201 | 202];
    if (success) return { status, description: success.description, fields: Object.entries(success.fields ?? {}) };
    const description = typeof response.description === 'string' ? response.description : REFUSALS[Number(status)].description;
    return { status, description, fields: [] };
  });
}

export function operationView(document: OpenApiDocument, operation: ApiOperation, baseUrl: string): OperationView {
  const resolve = resolverOf(document);
  const described = document.paths[operation.path][operation.method.toLowerCase()];
  const parameters = ((described.parameters ?? []) as JsonSchema[]).map((parameter) => ({
    name: `${String(parameter.name)} (${String(parameter.in)})`,
    type: typeWords(parameter.schema as JsonSchema, resolve),
    required: parameter.required === true,
    limits: limitWords(parameter.schema as JsonSchema, resolve),
    description: typeof parameter.description === 'string' ? parameter.description : parameter.in === 'path' ? 'The record\'s id' : '',
  }));
  const body = (described.requestBody as JsonSchema | undefined)?.content as Record<string, { schema: JsonSchema }> | undefined;
  const bodyFields = operation.body.kind === 'json' && body ? fieldRows(body['application/json'].schema, resolve) : [];
  return { operation, anchor: operationId(operation), parameters, bodyFields, answers: answersOf(operation, described), curl: curlExample(operation, baseUrl) };
}

export function referenceByArea(document: OpenApiDocument, operations: readonly ApiOperation[], baseUrl: string): { area: ApiArea; anchor: string; views: OperationView[] }[] {
  return API_AREAS.map((area) => ({
    area,
    anchor: area.toLowerCase().replace(/[^a-z]+/g, '-'),
    views: operations.filter((operation) => operation.area === area).map((operation) => operationView(document, operation, baseUrl)),
  }));
}
