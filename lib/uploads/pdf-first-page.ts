// Renders the first page of a PDF to PNG with poppler's pdftoppm (Debian's poppler-utils), at
// RENDER_DPI but never more than MAX_STORED_SIDE_PX on the longest side: the page size is read first
// (pdfinfo), and pdftoppm is told the output size (-scale-to), so a page of any size costs at most that.
import { execFile } from 'node:child_process';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { AppError } from '@/lib/errors';
import { MAX_STORED_SIDE_PX } from './pixel-limits';

const run = promisify(execFile);
const RENDER_DPI = 110;
const POINTS_PER_INCH = 72;
/** Time allowed to each poppler program before it is killed. */
const PDFINFO_TIMEOUT_MS = 10_000;
const PDFTOPPM_TIMEOUT_MS = 20_000;

const NEEDS_POPPLER = 'PDF plans need poppler-utils on the server (apt-get install poppler-utils). Upload a PNG, JPEG or WebP instead.';
const UNREADABLE = 'The PDF could not be read. Is it damaged or password-protected? Export the plan page as PNG and upload that.';

function popplerError(error: unknown): AppError {
  const failure = error as NodeJS.ErrnoException & { killed?: boolean };
  if (failure.code === 'ENOENT') return new AppError('bad_input', NEEDS_POPPLER, { field: 'file' });
  if (failure.killed) {
    return new AppError('bad_input', `The PDF's first page took longer than ${PDFTOPPM_TIMEOUT_MS / 1000} s to draw. Export the plan page as PNG and upload that.`, { field: 'file' });
  }
  return new AppError('bad_input', UNREADABLE, { field: 'file' });
}

/** The longest side of page 1, in points, as pdfinfo reports it (`Page    1 size: 595 x 842 pts`); null when it says nothing usable. */
async function firstPageLongestSidePt(input: string): Promise<number | null> {
  const { stdout } = await run('pdfinfo', ['-f', '1', '-l', '1', input], { timeout: PDFINFO_TIMEOUT_MS, killSignal: 'SIGKILL' });
  const size = /Page\s+1\s+size:\s+([\d.]+)\s+x\s+([\d.]+)\s+pts/.exec(stdout);
  const longest = size ? Math.max(Number(size[1]), Number(size[2])) : NaN;
  return Number.isFinite(longest) && longest > 0 ? longest : null;
}

/** Output size of the longest side, px: the page at RENDER_DPI, at most MAX_STORED_SIDE_PX. */
export function renderedLongestSidePx(longestSidePt: number | null): number {
  if (longestSidePt === null) return MAX_STORED_SIDE_PX;
  return Math.max(1, Math.min(MAX_STORED_SIDE_PX, Math.round((longestSidePt * RENDER_DPI) / POINTS_PER_INCH)));
}

export async function renderPdfFirstPage(pdf: Uint8Array): Promise<Uint8Array> {
  const folder = await mkdtemp(path.join(tmpdir(), 'antinode-pdf-'));
  try {
    const input = path.join(folder, 'plan.pdf');
    await writeFile(input, pdf);
    try {
      const sidePx = renderedLongestSidePx(await firstPageLongestSidePt(input));
      await run('pdftoppm', ['-png', '-f', '1', '-l', '1', '-scale-to', String(sidePx), '-singlefile', input, path.join(folder, 'page')], { timeout: PDFTOPPM_TIMEOUT_MS, killSignal: 'SIGKILL' });
    } catch (error) {
      throw popplerError(error);
    }
    return new Uint8Array(await readFile(path.join(folder, 'page.png')));
  } finally {
    await rm(folder, { recursive: true, force: true });
  }
}
