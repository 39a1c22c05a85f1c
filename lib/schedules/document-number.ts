// The schedule's document number: the same for every revision of one plan, so a revision is told by
// its number beside it. Initials of the project and the plan (whole numbers kept, "Level 1" → "L1"),
// the first four characters of the plan's id so two plans with the same initials differ, and "TS"
// for treatment schedule: "MAC-L1RRS-5F1C-TS". Common practice, no source.

const MAX_INITIALS = 6;

export function initialsOf(name: string): string {
  const words = name.normalize('NFKD').replace(/\p{M}/gu, '').replace(/[^\p{L}\p{N}\s]/gu, ' ').split(/\s+/).filter(Boolean);
  const initials = words.map((word) => (/^\p{N}+$/u.test(word) ? word : word[0])).join('').toUpperCase().replace(/[^A-Z0-9]/g, '');
  return initials.slice(0, MAX_INITIALS) || 'X';
}

export function scheduleDocumentNumber(projectName: string, planName: string, planId: string): string {
  const idPart = planId.replace(/[^0-9a-f]/gi, '').slice(0, 4).toUpperCase() || '0000';
  return `${initialsOf(projectName)}-${initialsOf(planName)}-${idPart}-TS`;
}
