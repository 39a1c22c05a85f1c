// Against the production build: pages for records that do not exist answer 404 (not 200 with the
// not-found text after a loading skeleton has streamed), and malformed server action calls are
// refused by the proxy with 400, 403 or 413 instead of Next's 500. Statuses from RFC 9110 §15.5.
import { randomUUID } from 'node:crypto';
import { expect, test, type Page } from '@playwright/test';
import { Project } from '@/models';
import { createPerson, createTeam, PASSWORD, signIn, uniqueEmail } from './fixtures';

test('pages for unknown or malformed ids answer 404 with the not-found page, for a signed-in member', async ({ page }) => {
  const team = await createTeam('Missing records');
  const project = await Project.create({ teamId: team.id, name: 'Only project', site: '' });
  const { email } = await createPerson('missing', [{ team, role: 'acoustician' }]);
  await signIn(page, email);
  const unknown = randomUUID();
  for (const path of [
    `/projects/${unknown}`, '/projects/not-an-id', '/projects/------------------------------------',
    `/plans/${unknown}`, `/plans/${unknown}/revisions`, `/plans/${unknown}/revisions/1`, `/plans/${unknown}/revisions/1/schedule`, '/plans/not-an-id/revisions',
  ]) {
    const response = await page.goto(path);
    expect(response?.status(), path).toBe(404);
    await expect(page.getByRole('heading', { name: 'Nothing here' })).toBeVisible();
  }
  const found = await page.goto(`/projects/${project.id}`);
  expect(found?.status()).toBe(200);
  await expect(page.getByRole('heading', { name: 'Only project' })).toBeVisible();
});

// The id of the sign-in action, as the browser sends it when the form is submitted.
async function signInActionId(page: Page, email: string): Promise<string> {
  await page.goto('/sign-in');
  const sent = page.waitForRequest((request) => Boolean(request.headers()['next-action']));
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  return (await sent).headers()['next-action'];
}

test('malformed server action calls are refused with 400, 403 or 413, and a plain call still runs', async ({ page, baseURL }) => {
  const email = uniqueEmail('action');
  const actionId = await signInActionId(page, email);
  const send = (body: BodyInit, headers: Record<string, string> = {}) => fetch(`${baseURL}/sign-in`, {
    method: 'POST', headers: { 'next-action': actionId, 'content-type': 'text/plain;charset=UTF-8', ...headers }, body, duplex: 'half',
  } as RequestInit);

  const plain = await send(JSON.stringify([{ email, password: PASSWORD }]));
  expect(plain.status).toBe(200);
  expect(await plain.text()).toContain('wrong_credentials');

  for (const [label, body, headers] of [
    ['not JSON', 'garbage{{', {}],
    ['empty', '', {}],
    ['not a list of arguments', '"hello"', {}],
    ['a reference to a missing part', '["$Q5"]', {}],
    ['too many arguments', JSON.stringify(Array.from({ length: 2000 }, () => 1)), {}],
    ['a multipart body', '--x\r\nContent-Disposition: form-data; name="0"\r\n\r\nnot json\r\n--x--\r\n', { 'content-type': 'multipart/form-data; boundary=x' }],
  ] as const) {
    const answer = await send(body, headers);
    expect(answer.status, label).toBe(400);
    expect(await answer.text(), label).toMatch(/^Invalid Server Action request/);
  }

  expect((await send('[1]', { origin: 'https://elsewhere.example' })).status).toBe(403);

  // 30 MB sent in chunks with no Content-Length: refused at 256 KB, the server still answers.
  let remaining = 30 * 1024 * 1024;
  const chunk = new Uint8Array(64 * 1024).fill(0x20);
  const chunked = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (remaining <= 0) { controller.close(); return; }
      remaining -= chunk.byteLength;
      controller.enqueue(chunk);
    },
  });
  const tooLarge = await send(chunked);
  expect(tooLarge.status).toBe(413);
  expect((await fetch(`${baseURL}/api/v1/health`)).status).toBe(200);
});

test('a form posted to a page without JavaScript is refused with 400, not decoded', async ({ baseURL }) => {
  const answer = await fetch(`${baseURL}/sign-in`, { method: 'POST', headers: { 'content-type': 'multipart/form-data; boundary=x' }, body: 'garbage' });
  expect(answer.status).toBe(400);
});
