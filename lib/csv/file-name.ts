// A downloaded file's name from its parts (plan, run or room, kind): each part in lower case with every
// run of other characters than letters, digits, dots and hyphens made one hyphen, joined by underscores
// ("recital-room-supply_run-a_resonances.csv"), so the name is safe on every file system.

function part(text: string): string {
  return text.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase().replace(/[^a-z0-9.-]+/g, '-').replace(/^[-.]+|[-.]+$/g, '');
}

/** At most this many characters of each part, so a long plan name leaves room for the kind. */
const MAX_PART_CHARS = 60;

export function csvFileName(parts: readonly string[], kind: string): string {
  const named = [...parts, kind].map((text) => part(text).slice(0, MAX_PART_CHARS).replace(/-+$/, '')).filter((text) => text !== '');
  return `${named.join('_') || 'export'}.csv`;
}
