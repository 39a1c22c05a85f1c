// The reference page's parts read from a JSON Schema and an operation: field rows and the curl example
// (behaviour of this project; the shell quoting follows POSIX sh, "Quoting", single quotes).
import { execFileSync } from 'node:child_process';
import { z } from 'zod';
import { describe, expect, it } from 'vitest';
import { curlExample } from '@/lib/api-description/curl';
import { fieldRows } from '@/lib/api-description/field-rows';
import { jsonSchemaOf } from '@/lib/api-description/json-schema';
import type { ApiOperation } from '@/lib/api-description/types';

const noRefs = () => undefined;

describe('fieldRows', () => {
  it('names each field with its type, whether it is required, its limits and meaning, nested ones by path', () => {
    const schema = z.object({
      name: z.string().min(1).max(80).describe('What to call it'),
      lengthM: z.number().positive().max(500).optional(),
      temperatureC: z.number().min(-40).max(60),
      end: z.discriminatedUnion('kind', [z.object({ kind: z.literal('closed') }), z.object({ kind: z.literal('open'), flange: z.enum(['flanged', 'unflanged']) })]),
      segments: z.array(z.object({ teamId: z.uuid() })).min(1),
    });
    expect(fieldRows(jsonSchemaOf(schema), noRefs)).toEqual([
      { name: 'name', type: 'string', required: true, limits: '1–80 characters', description: 'What to call it' },
      { name: 'lengthM', type: 'number', required: false, limits: '> 0, ≤ 500', description: '' },
      { name: 'temperatureC', type: 'number', required: true, limits: '≥ \u221240, ≤ 60', description: '' },
      { name: 'end', type: '"closed" | "open" (flange)', required: true, limits: '', description: '' },
      { name: 'segments', type: 'array of object', required: true, limits: '1–… items', description: '' },
      { name: 'segments[].teamId', type: 'id (UUID)', required: true, limits: '', description: '' },
    ]);
  });
});

describe('curlExample', () => {
  const operation: ApiOperation = {
    method: 'POST', path: '/api/v1/plans/{planId}/revisions', area: 'Revisions, review and schedules', access: 'plan.edit', summary: 'Submit',
    pathExample: { planId: '6f1c2a3e-0b4d-4f5a-9c7e-2d8b1a0e3f47' },
    body: { kind: 'json', schema: z.object({ note: z.string() }), example: { note: "the fan's tone" }, exampleSummary: 'A note' },
    responses: {},
  };

  it('puts the example ids in the path, the token in a header and the body as JSON', () => {
    const command = curlExample(operation, 'https://antinode.example');
    expect(command).toContain("curl -X POST 'https://antinode.example/api/v1/plans/6f1c2a3e-0b4d-4f5a-9c7e-2d8b1a0e3f47/revisions'");
    expect(command).toContain('-H "Authorization: Bearer $ANTINODE_TOKEN"');
  });

  it('quotes the body so that a shell hands curl exactly the JSON, apostrophes included', () => {
    const command = curlExample(operation, 'https://antinode.example');
    const quotedBody = command.slice(command.indexOf('-d ') + 3);
    const seenByCurl = execFileSync('/bin/sh', ['-c', `printf '%s' ${quotedBody}`]).toString();
    expect(JSON.parse(seenByCurl)).toEqual({ note: "the fan's tone" });
  });
});
