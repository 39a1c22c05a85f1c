// A word's box against the drawn ducts (worked by hand; product layout rule, no outside source).
import { describe, expect, it } from 'vitest';
import { boxIsClear, lineTouchesBox } from '@/components/editor/canvas/box-clear';

const box = { x: 10, y: 10, width: 20, height: 10 };

describe('a word box and the ducts', () => {
  it('a duct crossing the box touches it, even with both ends outside', () => {
    expect(lineTouchesBox({ x1: 0, y1: 15, x2: 100, y2: 15, halfWidth: 0 }, box)).toBe(true);
    expect(lineTouchesBox({ x1: 0, y1: 0, x2: 40, y2: 40, halfWidth: 0 }, box)).toBe(true);
  });

  it('a duct passing 3 units below touches only when drawn more than 6 wide', () => {
    const below = { x1: 0, y1: 23, x2: 100, y2: 23 };
    expect(lineTouchesBox({ ...below, halfWidth: 2 }, box)).toBe(false);
    expect(lineTouchesBox({ ...below, halfWidth: 4 }, box)).toBe(true);
  });

  it('clear of every duct, or not', () => {
    expect(boxIsClear(box, [{ x1: 50, y1: 0, x2: 50, y2: 100, halfWidth: 5 }])).toBe(true);
    expect(boxIsClear(box, [{ x1: 50, y1: 0, x2: 50, y2: 100, halfWidth: 5 }, { x1: 20, y1: 0, x2: 20, y2: 5, halfWidth: 6 }])).toBe(false);
  });
});
