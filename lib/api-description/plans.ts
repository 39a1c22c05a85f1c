// Projects, plans, the drawn document and plan drawings.
import { newPlanSchema, planBackgroundSchema, planMetaSchema, savePlanSchema } from '@/lib/plans/schemas';
import { projectInputSchema, projectUpdateSchema } from '@/lib/projects/schemas';
import { MAX_UPLOAD_BYTES } from '@/lib/uploads/data';
import { EXAMPLE_IDS, ONE_RUN_DOCUMENT } from './examples';
import type { ApiOperation, HandQueryParameter } from './types';

const ARCHIVED: HandQueryParameter = { name: 'archived', description: '"include" lists archived ones too (default: only those not archived).', schema: { type: 'string', enum: ['include'] } };
const PROJECT_FIELDS = 'id, name, site, archived, version (send it with a change), updatedAt';
const PLAN_FIELDS = 'id, name, archived, version (of the drawing), detailsVersion (of name and archive state), updatedAt, hasBackground';
const project = { projectId: EXAMPLE_IDS.projectId };
const plan = { planId: EXAMPLE_IDS.planId };

export const PLAN_OPERATIONS: ApiOperation[] = [
  {
    method: 'GET', path: '/api/v1/projects', area: 'Projects and plans', access: 'project.read', summary: 'List the team\'s projects',
    query: { parameters: [ARCHIVED] }, body: { kind: 'none' },
    responses: { 200: { description: 'The projects.', fields: { projects: `Each: ${PROJECT_FIELDS}` } } },
  },
  {
    method: 'POST', path: '/api/v1/projects', area: 'Projects and plans', access: 'project.create', maxBodyBytes: 8192, summary: 'Create a project',
    body: { kind: 'json', schema: projectInputSchema, example: { name: 'Harbour Hall', site: 'Quay 4, Northmouth' }, exampleSummary: 'A new project' },
    responses: { 201: { description: 'The project.', fields: { project: PROJECT_FIELDS } } },
  },
  {
    method: 'GET', path: '/api/v1/projects/{projectId}', area: 'Projects and plans', access: 'project.read', summary: 'Read a project',
    pathExample: project, body: { kind: 'none' },
    responses: { 200: { description: 'The project.', fields: { project: PROJECT_FIELDS } } },
  },
  {
    method: 'PATCH', path: '/api/v1/projects/{projectId}', area: 'Projects and plans', access: 'project.update', maxBodyBytes: 8192, summary: 'Rename, move or archive a project',
    description: 'Carries the version the change was made from; a change from an older copy is refused, nothing changed.',
    pathExample: project,
    body: { kind: 'json', schema: projectUpdateSchema, example: { version: 3, name: 'Harbour Hall, stage 2' }, exampleSummary: 'A rename' },
    responses: { 200: { description: 'The project as changed.', fields: { project: PROJECT_FIELDS } } },
    refusals: { 409: 'Someone changed the project since that version (field "version").' },
  },
  {
    method: 'GET', path: '/api/v1/projects/{projectId}/plans', area: 'Projects and plans', access: 'plan.read', summary: 'List a project\'s plans',
    pathExample: project, query: { parameters: [ARCHIVED] }, body: { kind: 'none' },
    responses: { 200: { description: 'The plans.', fields: { plans: `Each: ${PLAN_FIELDS}` } } },
  },
  {
    method: 'POST', path: '/api/v1/projects/{projectId}/plans', area: 'Projects and plans', access: 'plan.edit', maxBodyBytes: 4096, summary: 'Create a plan',
    pathExample: project,
    body: { kind: 'json', schema: newPlanSchema, example: { name: 'Level 2 supply' }, exampleSummary: 'A new, empty plan' },
    responses: { 201: { description: 'The plan.', fields: { plan: PLAN_FIELDS } } },
  },
  {
    method: 'GET', path: '/api/v1/plans/{planId}', area: 'Projects and plans', access: 'plan.read', summary: 'Read a plan with its drawn document',
    pathExample: plan, body: { kind: 'none' },
    responses: { 200: { description: 'The plan.', fields: { plan: 'id, name, archived, version, detailsVersion, updatedAt, project { id, name }, metresPerPixel, background (the drawing, or null), document (nodes, segments, runs with their terminations, rooms, treatments)' } } },
  },
  {
    method: 'PATCH', path: '/api/v1/plans/{planId}', area: 'Projects and plans', access: 'plan.edit', maxBodyBytes: 4096, summary: 'Rename or archive a plan',
    description: 'Carries detailsVersion, kept apart from the drawing\'s version so a rename never conflicts with an open editor\'s next save.',
    pathExample: plan,
    body: { kind: 'json', schema: planMetaSchema, example: { detailsVersion: 2, name: 'Level 2 supply, revised' }, exampleSummary: 'A rename' },
    responses: { 200: { description: 'The plan as changed.', fields: { plan: PLAN_FIELDS } } },
    refusals: { 409: 'Someone renamed or archived the plan since that detailsVersion (field "detailsVersion").' },
  },
  {
    method: 'PUT', path: '/api/v1/plans/{planId}/document', area: 'Projects and plans', access: 'plan.edit', maxBodyBytes: 4 * 1024 * 1024, summary: 'Save the drawn document',
    description: 'Saves the whole document (nodes in plan pixels, segments, runs and their ends, rooms, chosen treatments) with the scale and the version it was loaded at, and bumps the version. The document is checked against the plan\'s limits (at most 200 runs, 3000 segments …), naming the field.',
    pathExample: plan,
    body: { kind: 'json', schema: savePlanSchema, example: { version: 7, metresPerPixel: 0.01, document: ONE_RUN_DOCUMENT }, exampleSummary: 'A plan with one run of one segment' },
    responses: { 200: { description: 'Saved.', fields: { version: 'The new version', updatedAt: 'When, ISO 8601' } } },
    refusals: { 409: 'Someone saved the plan since that version; nothing was changed.' },
  },
  {
    method: 'POST', path: '/api/v1/plans/{planId}/background', area: 'Projects and plans', access: 'plan.edit', maxBodyBytes: MAX_UPLOAD_BYTES + 64 * 1024, summary: 'Upload the plan\'s drawing',
    description: 'A PNG, JPEG or WebP of up to 20 MB, or a PDF whose first page is used. Stored re-encoded, at most 6000 px on its longest side; a drawing declaring over 100 megapixels is refused.',
    pathExample: plan,
    body: { kind: 'form', field: 'file', description: 'The drawing, as multipart/form-data in the field "file".' },
    responses: { 201: { description: 'The stored drawing.', fields: { upload: 'id, fileName, contentType, bytes, widthPx, heightPx' } } },
  },
  {
    method: 'PUT', path: '/api/v1/plans/{planId}/background', area: 'Projects and plans', access: 'plan.edit', maxBodyBytes: 1024, summary: 'Put back an earlier drawing (undo an upload)',
    pathExample: plan,
    body: { kind: 'json', schema: planBackgroundSchema, example: { uploadId: EXAMPLE_IDS.uploadId }, exampleSummary: 'Back to an earlier drawing of the team' },
    responses: { 200: { description: 'The plan\'s drawing now.', fields: { background: 'The upload, or null for a blank grid' } } },
  },
  {
    method: 'DELETE', path: '/api/v1/plans/{planId}/background', area: 'Projects and plans', access: 'plan.edit', summary: 'Take the drawing away (a blank grid)',
    pathExample: plan, body: { kind: 'none' },
    responses: { 200: { description: 'Done.', fields: { background: 'null' } } },
  },
  {
    method: 'GET', path: '/api/v1/uploads/{uploadId}', area: 'Projects and plans', access: 'plan.read', summary: 'Download a stored drawing',
    pathExample: { uploadId: EXAMPLE_IDS.uploadId }, body: { kind: 'none' },
    responses: { 200: { description: 'The stored image, with its own content type.', contentType: 'application/octet-stream' } },
  },
];
