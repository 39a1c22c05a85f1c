// The demo's treatment schedule, page by page: every page drawn to PNG by poppler's pdftoppm carries the
// running header (practice, document number, revision, status, date) and "Page x of y"; the plan figure
// names every segment with its size, the outlets, listeners and the chosen treatment; the first page
// says which room misses its criterion; and page 1 matches the committed reference render within a
// tolerance for antialiasing (pixelmatch). The render is the same every time: fixed content, fixed
// date, the fonts embedded from public/fonts.
// ANTINODE_UPDATE_REFERENCE=1 writes a new reference (look at it before committing it).
import { execFileSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import pixelmatch from 'pixelmatch';
import { PNG } from 'pngjs';
import { extractText, getDocumentProxy } from 'unpdf';
import { beforeAll, describe, expect, it } from 'vitest';
import { planLabels } from '@/lib/plan/labels';
import { renderSchedulePdf } from '@/lib/schedules/render';
import { describeSize } from '@/lib/schedules/describe';
import type { ScheduleContent } from '@/lib/schedules/content';
import { DEMO_PRACTICE_NAME, DEMO_SCHEDULE_DATE, demoRevision, demoScheduleContent } from '../../helpers/demo-schedule';

const REFERENCE = path.join(__dirname, 'reference', 'demo-schedule-page-1.png');
const RESOLUTION_DPI = 72;
// Per-pixel colour distance pixelmatch counts as different (its default 0.1), antialiased pixels not counted.
const PIXEL_THRESHOLD = 0.1;
// At most this share of page 1's pixels may differ: room for a different poppler or FreeType build's antialiasing (common practice, no source).
const MAX_DIFFERENT_SHARE = 0.0002;

let content: ScheduleContent;
let pages: string[];
let pngs: string[];
let dir: string;

beforeAll(async () => {
  content = demoScheduleContent();
  const bytes = await renderSchedulePdf(content, DEMO_SCHEDULE_DATE);
  dir = mkdtempSync(path.join(tmpdir(), 'schedule-pages-'));
  writeFileSync(path.join(dir, 'schedule.pdf'), bytes);
  const { text } = await extractText(await getDocumentProxy(new Uint8Array(bytes)), { mergePages: false });
  pages = text;
  execFileSync('pdftoppm', ['-png', '-r', String(RESOLUTION_DPI), path.join(dir, 'schedule.pdf'), path.join(dir, 'page')]);
  pngs = readdirSync(dir).filter((name) => name.endsWith('.png')).sort().map((name) => path.join(dir, name));
  if (process.env.ANTINODE_SCHEDULE_PAGES_DIR) {
    mkdirSync(process.env.ANTINODE_SCHEDULE_PAGES_DIR, { recursive: true });
    for (const file of pngs) copyFileSync(file, path.join(process.env.ANTINODE_SCHEDULE_PAGES_DIR, path.basename(file)));
  }
}, 60_000);

describe('the demo treatment schedule, page by page', () => {
  it('draws every page to a PNG, and each carries the running header and "Page x of y"', () => {
    expect(pages.length).toBeGreaterThanOrEqual(6);
    expect(pngs).toHaveLength(pages.length);
    pages.forEach((page, index) => {
      const where = `page ${index + 1}`;
      expect(page, where).toContain(DEMO_PRACTICE_NAME);
      expect(page, where).toContain(content.documentNumber);
      expect(page, where).toContain(`revision ${content.revisionNumber}`);
      expect(page, where).toContain('Status: Issued');
      expect(page, where).toContain('2026-12-07');
      expect(page, where).toContain(`Page ${index + 1} of ${pages.length}`);
      expect(page, where).toContain('Marrowgate Arts Centre');
      const png = PNG.sync.read(readFileSync(pngs[index]));
      // A4, 595.28 × 841.89 pt (ISO 216), at 72 dpi: pdftoppm rounds each side up
      expect([png.width, png.height], where).toEqual([596, 842]);
    });
  });

  it('derives the document number from the project, the plan and the plan id', () => {
    expect(content.documentNumber).toBe('MAC-L1RRS-5F1C-TS');
  });

  it('labels every segment with its stable label and size on the plan figure, with the outlets, listeners and the treatment', () => {
    const revision = demoRevision();
    const labels = planLabels(revision.document);
    const figurePage = pages[1];
    expect(figurePage).toContain('1. Plan with the duct runs');
    for (const segment of revision.document.segments) expect(figurePage).toContain(`${labels.segments[segment.id]} ${describeSize(segment.section)}`);
    // the demo: A1 the Ø560 spiral riser, two Ø315 drops to the recital room's two outlets, heard at L1 and L2
    expect(figurePage).toContain('A1 Ø560');
    expect(figurePage).toContain('outlet A3 end');
    expect(figurePage).toContain('L1');
    expect(figurePage).toContain('L2');
    expect(figurePage).toContain('Recital room');
    expect(revision.document.treatments).toHaveLength(1);
    expect(figurePage).toContain('T1');
    expect(content.figure.treatments[0].drawn).toBe(true);
  });

  it('says on page 1 whether each room meets its criterion, and prints no code-like words', () => {
    const verdict = content.roomVerdicts[0];
    expect(pages[0]).toContain('In brief');
    expect(pages[0]).toContain(verdict.text.slice(0, 40));
    expect(verdict.text).toMatch(/^Recital room: NC \d+ predicted at L\d, the worst of 2 listeners against NC 20 — (meets|does not meet) its criterion/);
    const all = pages.join('\n');
    expect(all).not.toMatch(/area-change|elements\[|level-above-criterion|resonance-near-tone|revise_resubmit|accepted_with_notes/);
    // sections numbered from 1, each run under section 2
    const body = pages.slice(1).join('\n');
    const order = ['1. Plan with the duct runs', '2. Duct runs', '2.1 ', '3. Risk flags', '4. Rooms', '5. End reflection loss', '6. Revision history', '7. Assumptions', '8. Cautions', '9. Methods'].map((heading) => body.indexOf(heading));
    expect(order.every((at) => at >= 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
  });

  it('prints the end reflection loss of each outlet by octave band and the revision history with the reviewer\'s notes', () => {
    const all = pages.join('\n');
    expect(all).toContain('5. End reflection loss at the outlets');
    expect(content.outlets.map((outlet) => outlet.label)).toEqual(['A3 end', 'A5 end']);
    for (const outlet of content.outlets) for (const db of outlet.erlDb) expect(all).toContain(db.toFixed(1));
    expect(all).toContain('6. Revision history');
    expect(all).toContain('Revise and resubmit');
    expect(all).toContain('Accepted with the notes made');
    expect(all).toContain('Confirm the liner’s fire rating');
  });

  it('draws page 1 as the committed reference render does, within the tolerance', () => {
    const actual = PNG.sync.read(readFileSync(pngs[0]));
    if (process.env.ANTINODE_UPDATE_REFERENCE === '1' || !existsSync(REFERENCE)) {
      writeFileSync(REFERENCE, PNG.sync.write(actual));
      if (process.env.ANTINODE_UPDATE_REFERENCE !== '1') throw new Error(`No reference render was committed; one was written to ${REFERENCE}: look at it and commit it.`);
    }
    const expected = PNG.sync.read(readFileSync(REFERENCE));
    expect([actual.width, actual.height]).toEqual([expected.width, expected.height]);
    const diff = new PNG({ width: actual.width, height: actual.height });
    const different = pixelmatch(actual.data, expected.data, diff.data, actual.width, actual.height, { threshold: PIXEL_THRESHOLD });
    const share = different / (actual.width * actual.height);
    if (share > MAX_DIFFERENT_SHARE) writeFileSync(path.join(dir, 'page-1-diff.png'), PNG.sync.write(diff));
    expect(share, `page 1 differs from the reference in ${different} pixels; the difference is drawn in ${path.join(dir, 'page-1-diff.png')}`).toBeLessThanOrEqual(MAX_DIFFERENT_SHARE);
  });
});
