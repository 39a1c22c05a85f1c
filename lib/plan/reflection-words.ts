// The words for each kind of reflecting place the engine reports, as the results panel and the schedule print them.
const KIND_WORDS: Record<string, string> = { start: 'Start end', end: 'End', 'area-change': 'Area change', tee: 'Tee' };

export function reflectionKindWords(kind: string): string {
  return KIND_WORDS[kind] ?? kind.replace(/-/g, ' ');
}
