// Results downloaded as CSV from the demo recital plan, as an acoustician takes them to a spreadsheet:
// the run's resonances from the results panel and listener L1's noise path table from the room's
// sheet. Each file must parse (papaparse, RFC 4180) and hold, in its columns with units in the headers,
// the values shown on screen (to the decimals the screen shows). The exporters' own checks are in
// tests/unit/plan/exports.
import { readFile } from 'node:fs/promises';
import { expect, test, type Download, type Locator, type Page } from '@playwright/test';
import Papa from 'papaparse';
import { OCTAVE_BANDS_HZ } from '@/lib/acoustic';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { Plan } from '@/models';
import { acousticianWithProject } from './editor-fixtures';
import { signIn } from './fixtures';

/** The downloaded file's header and rows, by column name. */
async function readDownload(download: Download): Promise<{ header: string[]; rows: Record<string, string>[] }> {
  const text = await readFile((await download.path())!, 'utf8');
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { header: false });
  expect(parsed.errors).toEqual([]);
  const [header, ...lines] = parsed.data;
  return { header, rows: lines.map((cells) => Object.fromEntries(header.map((name, index) => [name, cells[index]]))) };
}

async function download(page: Page, button: Locator): Promise<Download> {
  const [file] = await Promise.all([page.waitForEvent('download'), button.click()]);
  return file;
}

/** A number as the screen shows it ("100.8 Hz", "−3.2") read as a number. */
const screenNumber = (text: string) => Number(text.replace('\u2212', '-').replace(/[^\d.-]/g, ''));
/** A file's number to the screen's decimals. */
const asShown = (text: string, decimals: number) => Number(Number(text).toFixed(decimals));

test('the resonances and a listener\'s noise path table download as CSV with the values shown on screen', async ({ page }) => {
  const { email, user, project } = await acousticianWithProject('results-csv');
  const document = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
  const plan = await Plan.create({ projectId: project.id, name: 'Recital supply', document, metresPerPixel: DEMO_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);

  // The resonances as the results panel lists them, then the file.
  const resonances = page.getByRole('table', { name: 'Resonances' });
  await expect(resonances.locator('tbody tr').first()).toBeVisible();
  const shown = await resonances.locator('tbody tr').evaluateAll((rows) => rows.map((row) => Array.from(row.querySelectorAll('td'), (cell) => cell.textContent ?? '')));
  expect(shown.length).toBeGreaterThan(2);
  const resonanceFile = await download(page, page.getByRole('button', { name: 'Download the resonances as CSV' }));
  expect(resonanceFile.suggestedFilename()).toBe('recital-supply_rooftop-air-handler-to-recital-room_resonances.csv');
  const resonanceCsv = await readDownload(resonanceFile);
  expect(resonanceCsv.header).toEqual(['Run', 'Order', 'Frequency (Hz)', 'Q', 'Bandwidth (Hz)', 'Fan tone (broad, clear or meets)', 'Fan tone met (Hz)', 'End correction at the start (m)', 'End correction at the end (m)']);
  expect(resonanceCsv.rows).toHaveLength(shown.length);
  shown.forEach(([order, frequency, q, bandwidth, tone], index) => {
    const row = resonanceCsv.rows[index];
    expect(row.Order).toBe(order.replace('▸', '').trim());
    expect(asShown(row['Frequency (Hz)'], 1)).toBe(screenNumber(frequency));
    expect(q === '—' ? row.Q : asShown(row.Q, 1)).toBe(q === '—' ? '' : screenNumber(q));
    expect(bandwidth === '—' ? row['Bandwidth (Hz)'] : asShown(row['Bandwidth (Hz)'], 1)).toBe(bandwidth === '—' ? '' : screenNumber(bandwidth));
    const word = row['Fan tone (broad, clear or meets)'];
    expect(tone).toContain(word);
    if (word === 'meets') expect(asShown(row['Fan tone met (Hz)'], 0)).toBe(screenNumber(tone));
  });
  // the demo's blade-pass tone sits on a resonance
  expect(resonanceCsv.rows.some((row) => row['Fan tone (broad, clear or meets)'] === 'meets')).toBe(true);

  // Listener L1's table on the room's noise path sheet, then its file.
  const drawer = page.getByRole('region', { name: 'Rooms and risks' });
  await drawer.getByRole('tab', { name: /^Rooms/ }).click();
  await drawer.getByRole('button', { name: 'Open Recital room' }).click();
  await page.getByTestId('room-panel').getByRole('button', { name: 'Noise path tables…' }).click();
  const sheet = page.getByTestId('noise-sheet');
  const table = sheet.getByTestId('listener-path-table').first();
  await expect(table).toBeVisible();
  const listenerRows = await table.locator('tbody tr').evaluateAll((rows) => rows.map((row) => ({
    words: row.querySelector('th')?.textContent ?? '',
    values: Array.from(row.querySelectorAll('td'), (cell) => cell.textContent ?? ''),
  })));
  const pathFile = await download(page, sheet.getByRole('button', { name: 'Download the path table at listener L1 as CSV' }));
  expect(pathFile.suggestedFilename()).toBe('recital-supply_recital-room_l1_noise-path.csv');
  const pathCsv = await readDownload(pathFile);
  const bandColumns = OCTAVE_BANDS_HZ.map((hz) => `${hz} Hz (dB)`);
  expect(pathCsv.header).toEqual(['Table', 'Row (lengths in m and mm)', 'Element', 'Source on the plan', 'Total (yes or no)', ...bandColumns]);
  const listenerCsv = pathCsv.rows.filter((row) => row.Table === 'At listener L1' && row.Element !== 'Ratings');
  const ratings = pathCsv.rows.find((row) => row.Element === 'Ratings')!;
  await expect(sheet.getByTestId('path-ratings').first()).toContainText(ratings['Row (lengths in m and mm)']);
  expect(listenerCsv.map((row) => row['Row (lengths in m and mm)'])).toEqual(listenerRows.map((row) => row.words));
  listenerRows.forEach((row, index) => bandColumns.forEach((column, band) => {
    // the screen rounds the full value to 0.1 dB, the file to 0.01 dB
    expect(Math.abs(Number(listenerCsv[index][column]) - screenNumber(row.values[band])), `${row.words}, ${column}`).toBeLessThanOrEqual(0.055);
  }));
  expect(listenerCsv.map((row) => row.Element).slice(-2)).toEqual(['Criterion', 'Margin']);
  // every outlet's path comes first, its duct rows naming their segments on the plan
  const outletTables = await sheet.getByTestId('outlet-path').count();
  expect(new Set(pathCsv.rows.map((row) => row.Table)).size).toBe(outletTables + 1);
  expect(pathCsv.rows.filter((row) => row.Element === 'Duct').map((row) => row['Source on the plan'])).toContain('A3');
});
