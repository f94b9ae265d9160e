/** How serious a standing caution is; shown as a word as well as a colour. */
export type Severity = 'danger' | 'caution';

/** A standing hazard note that applies to everyone, whatever is recorded in the app. */
export type CautionSpec = { key: string; severity: Severity; title: string; body: string };

/** The cautions the Safety section always shows; they are real hazards of the chemistry Ligandry covers. */
export const STANDING_CAUTIONS: readonly CautionSpec[] = [
  {
    key: 'cyanide-acid',
    severity: 'danger',
    title: 'Cyanide and acid release hydrogen cyanide gas',
    body:
      'Acid reaching a cyanide bath, its rinses or its salts liberates hydrogen cyanide, a gas that can kill. Keep cyanide baths alkaline and keep acids well away from them. Cyanide salts carry GHS H300, H310 and H330 (fatal if swallowed, in contact with skin or if inhaled) and EUH032 (contact with acids liberates very toxic gas).',
  },
  {
    key: 'ammoniacal-silver',
    severity: 'danger',
    title: 'Ammoniacal silver can leave explosive residues',
    body:
      'Silver held in ammonia solution can deposit explosive compounds as it stands. Common practice is never to store it: make only what the job needs and discard it the same day.',
  },
  {
    key: 'acid-fixer',
    severity: 'caution',
    title: 'Acidified thiosulfate fixer gives off sulfur dioxide',
    body:
      'Thiosulfate breaks down when fixer turns acidic, releasing sulfur dioxide gas and clouding the bath with sulfur. Ventilate where fixer can meet acid, and do not acidify it beyond its formulation.',
  },
];
