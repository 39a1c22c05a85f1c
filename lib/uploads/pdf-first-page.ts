// Renders the first page of a PDF to PNG with poppler's pdftoppm (Debian's poppler-utils).
import { execFile } from 'node:child_process';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { AppError } from '@/lib/errors';

const run = promisify(execFile);
const RENDER_DPI = 110;

export async function renderPdfFirstPage(pdf: Uint8Array): Promise<Uint8Array> {
  const folder = await mkdtemp(path.join(tmpdir(), 'antinode-pdf-'));
  try {
    const input = path.join(folder, 'plan.pdf');
    await writeFile(input, pdf);
    try {
      await run('pdftoppm', ['-png', '-f', '1', '-l', '1', '-r', String(RENDER_DPI), '-singlefile', input, path.join(folder, 'page')], { timeout: 30_000 });
    } catch (error) {
      const missing = (error as NodeJS.ErrnoException).code === 'ENOENT';
      throw new AppError('bad_input', missing
        ? 'PDF plans need poppler-utils on the server (apt-get install poppler-utils). Upload a PNG, JPEG or WebP instead.'
        : 'The PDF could not be read. Is it damaged or password-protected? Export the plan page as PNG and upload that.', { field: 'file' });
    }
    return new Uint8Array(await readFile(path.join(folder, 'page.png')));
  } finally {
    await rm(folder, { recursive: true, force: true });
  }
}
