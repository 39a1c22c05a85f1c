// A binary min-heap of wavefronts ordered by arrival time.

export interface Wavefront {
  timeS: number;
  node: number;
  fromEdge: number;
  amplitude: number;
  path: PathStep | null;
}

/** Reflection history as a shared linked list, turned into text only for recorded arrivals. */
export interface PathStep {
  label: string;
  previous: PathStep | null;
}

export class ArrivalQueue {
  private readonly items: Wavefront[] = [];

  get size(): number {
    return this.items.length;
  }

  push(item: Wavefront): void {
    const items = this.items;
    items.push(item);
    let child = items.length - 1;
    while (child > 0) {
      const parent = (child - 1) >> 1;
      if (items[parent].timeS <= item.timeS) break;
      items[child] = items[parent];
      child = parent;
    }
    items[child] = item;
  }

  pop(): Wavefront | undefined {
    const items = this.items;
    const first = items[0];
    const last = items.pop();
    if (items.length === 0 || last === undefined) return first;
    let parent = 0;
    for (;;) {
      const left = 2 * parent + 1;
      if (left >= items.length) break;
      const right = left + 1;
      const child = right < items.length && items[right].timeS < items[left].timeS ? right : left;
      if (items[child].timeS >= last.timeS) break;
      items[parent] = items[child];
      parent = child;
    }
    items[parent] = last;
    return first;
  }
}

export function pathText(step: PathStep | null): string {
  const labels: string[] = [];
  for (let current = step; current !== null; current = current.previous) labels.push(current.label);
  return labels.reverse().join(' → ');
}
