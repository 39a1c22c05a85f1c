// The room panel's mode list holds every mode the room analysis computed and marks each mode a flag
// cites, in words and a shape. Numbers come from the analysis of the demo plan's run to its first outlet
// (405 modes to about 151 Hz for its 14 m × 10 m × 6 m recital room; flags on modes (3,0,0), (4,0,0) and (5,0,0)).
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import type { RiskFlag } from '@/lib/acoustic';
import { ModeList } from '@/components/editor/rooms/mode-list';
import { modeRows, modeSubject } from '@/components/editor/rooms/mode-rows';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlanFirstOutletOnly } from '@/lib/plans/demo/recital-plan';
import { planRisks } from '@/lib/plans/risks';

const risks = planRisks(demoRecitalPlanFirstOutletOnly({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high }), DEMO_METRES_PER_PIXEL);
const modes = risks.rooms[0].analysis?.modes ?? [];
const roomFlags = risks.flags.filter((flag) => flag.roomId === 'recital-room');
const modeFlags = roomFlags.filter((flag) => flag.kind === 'resonance-near-room-mode');

const count = (markup: string, text: string) => markup.split(text).length - 1;

/** A flag like the engine's on a mode high in the list, above the 24 the list once stopped at. */
function flagOn(index: number): RiskFlag {
  const mode = modes[index];
  return { ...modeFlags[0], id: `resonance-near-room-mode:${mode.indices.join(',')}:test`, subject: modeSubject(mode), targetHz: mode.frequencyHz, severity: 'low', resonanceOrder: 30 };
}

describe('mode rows', () => {
  it('the demo analysis has more modes than the 24 the list once showed, and its room-mode flags', () => {
    expect(modes.length).toBeGreaterThan(24);
    expect(modeFlags.length).toBeGreaterThan(0);
  });

  it('keeps every mode, lowest first, with the flags that cite it; no cited mode is left out', () => {
    const { rows, unlisted } = modeRows(modes, roomFlags);
    expect(rows).toHaveLength(modes.length);
    for (let index = 1; index < rows.length; index += 1) expect(rows[index].mode.frequencyHz).toBeGreaterThanOrEqual(rows[index - 1].mode.frequencyHz);
    expect(unlisted).toEqual([]);
    const flagged = rows.filter((row) => row.flags.length > 0);
    expect(flagged.map((row) => modeSubject(row.mode)).sort()).toEqual([...new Set(modeFlags.map((flag) => flag.subject))].sort());
    for (const row of flagged) expect(row.flags.every((flag) => flag.subject === modeSubject(row.mode) && Math.abs(flag.targetHz - row.mode.frequencyHz) < 1e-9)).toBe(true);
  });

  it('a flag on a mode the list does not hold is reported, not dropped', () => {
    const stray = { ...flagOn(0), subject: 'room-mode:99,0,0', targetHz: 999 };
    expect(modeRows(modes, [stray]).unlisted).toEqual([stray]);
  });
});

describe('mode list', () => {
  it('renders a row for every mode and marks the flagged ones with severity (word and shape) and the resonance', () => {
    const high = modes.length - 1;
    const markup = renderToStaticMarkup(createElement(ModeList, { modes, flags: [...roomFlags, flagOn(high)] }));
    expect(count(markup, 'data-testid="mode-row"')).toBe(modes.length);
    expect(count(markup, 'data-flagged="yes"')).toBe(new Set(modeFlags.map((flag) => flag.subject)).size + 1);
    expect(markup).toContain(`all ${modes.length} modes to ${modes[high].frequencyHz.toFixed(1)} Hz`);
    expect(markup).toContain(`${modes[high].frequencyHz.toFixed(1)} Hz`);
    for (const flag of modeFlags) expect(markup).toContain(`flagged: duct resonance ${flag.resonanceOrder}`);
    expect(markup).toContain('data-severity="low"');
    // the shape of each cited flag's severity (high: a filled triangle, medium: a diamond)
    for (const flag of modeFlags) expect(markup).toContain(flag.severity === 'high' ? '<polygon points="6,1 11,11 1,11"' : flag.severity === 'medium' ? '<polygon points="6,1 11,6 6,11 1,6"' : 'data-severity="low"');
    expect(markup).toMatch(/<details[^>]*open/);
  });

  it('says when no mode is flagged', () => {
    const markup = renderToStaticMarkup(createElement(ModeList, { modes, flags: [] }));
    expect(markup).toContain('none flagged');
    expect(count(markup, 'data-flagged="yes"')).toBe(0);
  });
});
