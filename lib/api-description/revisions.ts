// Revisions (frozen plans), their review, and treatment schedules.
import { checkClearRowsSchema, decisionSchema, finishReviewSchema } from '@/lib/reviews/schemas';
import { submitRevisionSchema } from '@/lib/revisions/schemas';
import { EXAMPLE_IDS } from './examples';
import type { ApiOperation } from './types';

const AREA = 'Revisions, review and schedules';
const plan = { planId: EXAMPLE_IDS.planId };
const revision = { revisionId: EXAMPLE_IDS.revisionId };
const REVISION_FIELDS = 'id, planId, number, planVersion, contentHash, state (waiting for review, accepted, accepted with the notes made, revise and resubmit, rejected, superseded), note, submittedByName, reviewedByName, reviewedAt, reviewNote, createdAt';
const SCHEDULE_FIELDS = 'id, revisionId, status (rendering, issued, failed), failure (why, and what to do), sha256, bytes, issuedByName, askedAt, issuedAt, fileName';
const FINISHED = 'The review is already finished.';

export const REVISION_OPERATIONS: ApiOperation[] = [
  {
    method: 'GET', path: '/api/v1/plans/{planId}/revisions', area: AREA, access: 'plan.read', summary: 'List a plan\'s revisions',
    pathExample: plan, body: { kind: 'none' },
    responses: { 200: { description: 'Newest first.', fields: { revisions: `Each: ${REVISION_FIELDS}` } } },
  },
  {
    method: 'POST', path: '/api/v1/plans/{planId}/revisions', area: AREA, access: 'plan.edit', summary: 'Submit the saved plan for review',
    description: 'Freezes the saved document, its scale and its one analysis as the next revision, and mails the people who may review.',
    pathExample: plan,
    body: { kind: 'json', schema: submitRevisionSchema, example: { note: 'Riser retuned; please check run A.' }, exampleSummary: 'With a note to the reviewers' },
    responses: { 201: { description: 'The revision.', fields: { revision: REVISION_FIELDS } } },
  },
  {
    method: 'GET', path: '/api/v1/revisions/{revisionId}', area: AREA, access: 'plan.read', summary: 'Read a frozen revision and its review',
    pathExample: revision, body: { kind: 'none' },
    responses: {
      200: {
        description: 'The revision.',
        fields: { revision: `${REVISION_FIELDS}, document, analysis, extras`, decisions: 'Each row\'s mark (checked or query) with its note', tally: 'Rows checked, queried, not yet marked', queries: 'The queries raised', changes: 'What changed since the previous revision, in the reader\'s units' },
      },
    },
  },
  {
    method: 'PUT', path: '/api/v1/revisions/{revisionId}/decisions', area: AREA, access: 'review.write', summary: 'Mark one row: checked, or a query',
    pathExample: revision,
    body: { kind: 'json', schema: decisionSchema, example: { target: 'resonance:run-1:1', decision: 'query', note: 'Sits on the blade-pass tone at low speed: retune?' }, exampleSummary: 'A query on the first resonance of run-1' },
    responses: { 200: { description: 'The mark and the new tally.', fields: { decision: 'target, decision, note, reviewer, at', tally: 'Rows checked, queried, not yet marked' } } },
    refusals: { 409: FINISHED },
  },
  {
    method: 'POST', path: '/api/v1/revisions/{revisionId}/clear-rows', area: AREA, access: 'review.write', maxBodyBytes: 1024, summary: 'Check every clear row',
    description: 'Checks every row not yet marked, not at risk and with no open remark, in one step.',
    pathExample: revision,
    body: { kind: 'json', schema: checkClearRowsSchema, example: {}, exampleSummary: 'No fields' },
    responses: { 200: { description: 'How many were checked, and the new tally.', fields: { checked: 'Rows checked now', tally: 'Rows checked, queried, not yet marked' } } },
    refusals: { 409: FINISHED },
  },
  {
    method: 'POST', path: '/api/v1/revisions/{revisionId}/review', area: AREA, access: 'review.write', maxBodyBytes: 16 * 1024, summary: 'Finish the review with an outcome',
    description: 'Accepted (every row checked, no query), accepted with the notes made, revise and resubmit (a query or note saying what), or rejected (a note saying why). Mails the submitter.',
    pathExample: revision,
    body: { kind: 'json', schema: finishReviewSchema, example: { outcome: 'revise_resubmit', note: 'Retune the riser away from the blade-pass tone.' }, exampleSummary: 'Revise and resubmit' },
    responses: { 200: { description: 'The revision with its outcome.', fields: { revision: REVISION_FIELDS, tally: 'Rows checked, queried, not yet marked' } } },
    refusals: { 409: `${FINISHED} Or the outcome does not fit the marks (the message says why).` },
  },
  {
    method: 'GET', path: '/api/v1/revisions/{revisionId}/schedules', area: AREA, access: 'schedule.read', summary: 'List a revision\'s treatment schedules',
    pathExample: revision, body: { kind: 'none' },
    responses: { 200: { description: 'The schedules, with their progress.', fields: { schedules: `Each: ${SCHEDULE_FIELDS}` } } },
  },
  {
    method: 'POST', path: '/api/v1/revisions/{revisionId}/schedules', area: AREA, access: 'schedule.issue', summary: 'Issue the treatment schedule (PDF)',
    description: 'Recorded now as rendering; the job worker renders and stores it with its SHA-256. List the schedules to follow its progress.',
    pathExample: revision, body: { kind: 'none' },
    responses: { 202: { description: 'Asked for.', fields: { schedule: SCHEDULE_FIELDS } } },
  },
  {
    method: 'GET', path: '/api/v1/revisions/{revisionId}/schedule-preview', area: AREA, access: 'schedule.read', summary: 'Preview the schedule as it would be issued now',
    pathExample: revision, body: { kind: 'none' },
    responses: { 200: { description: 'The PDF, rendered on the fly and not kept.', contentType: 'application/pdf' } },
  },
  {
    method: 'GET', path: '/api/v1/schedules/{scheduleId}', area: AREA, access: 'schedule.read', summary: 'Download an issued schedule',
    description: 'The stored bytes, checked against their checksum; the SHA-256 is in the X-Content-SHA256 header.',
    pathExample: { scheduleId: EXAMPLE_IDS.scheduleId },
    query: { parameters: [{ name: 'inline', description: '"1" to show it in the browser rather than download it.', schema: { type: 'string', enum: ['1'] } }] },
    body: { kind: 'none' },
    responses: { 200: { description: 'The PDF.', contentType: 'application/pdf' } },
    refusals: { 409: 'The schedule is still rendering, or failed.' },
  },
];
