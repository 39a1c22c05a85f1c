// The schedule's numbered sections, in order: the contents on page 1 and every heading read from here.
export const SECTIONS = {
  plan: { number: 1, title: 'Plan with the duct runs, outlets and treatments' },
  runs: { number: 2, title: 'Duct runs: sections, terminations, resonances, reflections' },
  risks: { number: 3, title: 'Risk flags and treatments' },
  rooms: { number: 4, title: 'Rooms' },
  outlets: { number: 5, title: 'End reflection loss at the outlets' },
  history: { number: 6, title: 'Revision history' },
  assumptions: { number: 7, title: 'Assumptions and limits' },
  cautions: { number: 8, title: 'Cautions' },
  methods: { number: 9, title: 'Methods' },
} as const;

export type SectionName = keyof typeof SECTIONS;

export function sectionHeading(name: SectionName): string {
  return `${SECTIONS[name].number}. ${SECTIONS[name].title}`;
}
