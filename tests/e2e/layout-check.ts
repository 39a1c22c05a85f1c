// Layout checks for screenshots at a given size: nothing sticks out of the page sideways, no two
// controls or labels sit on top of each other, and no text is cut off by a box too small for it.
import { expect, type Locator, type Page } from '@playwright/test';

interface Problem { kind: string; what: string }

export async function layoutProblems(page: Page, scope: Locator): Promise<Problem[]> {
  return scope.evaluate((root) => {
    const problems: { kind: string; what: string }[] = [];
    const name = (element: Element) => `${element.tagName.toLowerCase()}${element.id ? `#${element.id}` : ''} “${(element.textContent ?? '').trim().slice(0, 40)}”`;
    if (document.documentElement.scrollWidth > window.innerWidth + 1) {
      problems.push({ kind: 'page wider than the window', what: `${document.documentElement.scrollWidth} > ${window.innerWidth}` });
    }
    const visible = (element: Element) => {
      const box = element.getBoundingClientRect();
      const style = getComputedStyle(element);
      return box.width > 0 && box.height > 0 && style.visibility !== 'hidden' && style.display !== 'none';
    };
    // What of an element shows: its box cut by every ancestor that clips (a scrolled side panel
    // hides what is scrolled out of it; that part is not on the screen to overlap anything).
    const shownBox = (element: Element) => {
      const box = element.getBoundingClientRect();
      let left = box.left; let top = box.top; let right = box.right; let bottom = box.bottom;
      for (let parent = element.parentElement; parent; parent = parent.parentElement) {
        const style = getComputedStyle(parent);
        if (style.overflowX === 'visible' && style.overflowY === 'visible') continue;
        const clip = parent.getBoundingClientRect();
        left = Math.max(left, clip.left); top = Math.max(top, clip.top); right = Math.min(right, clip.right); bottom = Math.min(bottom, clip.bottom);
      }
      return { left, top, right, bottom };
    };
    const onScreen = (element: Element) => { const box = shownBox(element); return box.right - box.left > 1 && box.bottom - box.top > 1; };
    // Controls, marks and short labels: none may overlap another that it does not contain.
    const pieces = [...root.querySelectorAll('button, a, input, select, textarea, label, [data-testid="revision-state"], [data-testid="waiting-marker"], th, h1, h2, h3')]
      .filter(visible)
      .filter(onScreen)
      .filter((element) => !element.closest('[aria-hidden="true"], .konvajs-content'));
    for (let i = 0; i < pieces.length; i += 1) {
      for (let j = i + 1; j < pieces.length; j += 1) {
        const a = pieces[i];
        const b = pieces[j];
        if (a.contains(b) || b.contains(a)) continue;
        const ra = shownBox(a);
        const rb = shownBox(b);
        const overlapX = Math.min(ra.right, rb.right) - Math.max(ra.left, rb.left);
        const overlapY = Math.min(ra.bottom, rb.bottom) - Math.max(ra.top, rb.top);
        if (overlapX > 1 && overlapY > 1) problems.push({ kind: 'overlap', what: `${name(a)} and ${name(b)}` });
      }
    }
    // Text cut off: a box that hides its overflow but holds more than it shows (scroll areas, and
    // text fields, which scroll what is typed into them, excepted).
    for (const element of root.querySelectorAll('*')) {
      if (!visible(element) || element.closest('.konvajs-content') || element.matches('input, textarea')) continue;
      const style = getComputedStyle(element);
      const clips = (value: string) => value === 'hidden' || value === 'clip';
      if ((clips(style.overflowX) && element.scrollWidth > element.clientWidth + 1) || (clips(style.overflowY) && element.scrollHeight > element.clientHeight + 1)) {
        if (element.classList.contains('sr-only')) continue;
        problems.push({ kind: 'clipped', what: name(element) });
      }
      if (style.textOverflow === 'ellipsis' && element.scrollWidth > element.clientWidth + 1) problems.push({ kind: 'cut short', what: name(element) });
    }
    return problems;
  });
}

// The header's account button shortens a long name with an ellipsis on purpose; check within `main` (or a dialog).
export async function expectCleanLayout(page: Page, scope: Locator = page.getByRole('main')): Promise<void> {
  expect(await layoutProblems(page, scope)).toEqual([]);
}
