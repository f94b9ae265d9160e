import { fireEvent, render, screen, within } from '@testing-library/react-native';
import { type ReactElement } from 'react';

import { formatEvidenceValue, ghsLine, worstSeverity } from '@/components/hazards/format';
import { GhsPictogram } from '@/components/hazards/ghs-pictogram';
import { HazardBanner } from '@/components/hazards/hazard-banner';
import { HAZARD_SHORT_LABELS, HazardChips } from '@/components/hazards/hazard-chips';
import { HazardSection } from '@/components/hazards/hazard-section';
import { buildTheme, ThemeContext } from '@/components/theme/theme-provider';
import { DEFER_TO_SDS, GHS_PICTOGRAMS, HAZARD_RULES, type GhsPictogram as GhsCode, type Hazard, type ReviewEvent, type ReviewSummary } from '@/shared/safety';

// Hand-made hazards in the shape lib/hazards returns; the texts are invented for the test.
const cyanidePresent: Hazard = {
  rule: 'cyanide_present',
  severity: 'caution',
  flag: false,
  title: 'Cyanide in the bath',
  text: 'The bath holds cyanide. Keep acids away from it.',
  evidence: [{ label: 'Total cyanide', value: 0.9, unit: 'mol/L', note: 'analysis' }],
  ghs: [
    { code: 'H300', text: 'Fatal if swallowed' },
    { code: 'H410', text: 'Very toxic to aquatic life with long lasting effects.' },
  ],
  pictograms: ['GHS06', 'GHS09'],
  reagents: ['NaCN'],
  source: 'common practice',
};
const cyanideLowPh: Hazard = {
  rule: 'cyanide_low_ph',
  severity: 'danger',
  flag: true,
  title: 'Cyanide below pH 11',
  text: 'At this pH part of the free cyanide is HCN, which leaves the solution as a gas.',
  evidence: [
    { label: 'pH', value: 10 },
    { label: 'HCN share of free cyanide', value: 0.14, unit: 'fraction', note: 'engine speciation' },
    { label: 'Largest share allowed', value: 0.02, unit: 'fraction', note: 'threshold' },
    { label: 'Fume hood named', value: null },
  ],
  ghs: [{ code: 'H330', text: 'Fatal if inhaled' }],
  pictograms: ['GHS06'],
  reagents: ['HCN'],
  source: 'pKa 9.21 (a named handbook, from memory)',
};
const ammoniaVapour: Hazard = {
  rule: 'ammonia_vapour',
  severity: 'caution',
  flag: false,
  title: 'Ammonia vapour',
  text: 'Ammonia comes off the bath; work with extraction.',
  evidence: [{ label: 'Total ammonia', value: 1.2, unit: 'mol/L' }],
  ghs: [{ code: 'H314', text: 'Causes severe skin burns and eye damage' }],
  pictograms: ['GHS05', 'GHS07'],
  reagents: ['aqueous ammonia'],
  source: 'common practice',
  step: 2,
};
const hazards = [cyanidePresent, cyanideLowPh, ammoniaVapour];

const sam = { id: 'u-safe', name: 'Sam Reyes' };
const theo = { id: 'u-tech', name: 'Theo Bench' };
const signedOff: ReviewSummary = {
  id: 'rev-1',
  subject: { kind: 'run', id: 'run-cn', title: 'Cyanide bath', calculator: 'speciation' },
  status: 'signed_off',
  flags: ['cyanide_low_ph'],
  submittedBy: theo,
  submittedAt: '2026-03-04T09:00:00.000Z',
  decidedBy: sam,
  decidedAt: '2026-03-04T10:00:00.000Z',
  conditions: 'Fume hood on; second person present.',
  note: null,
};
const sentBack: ReviewSummary = { ...signedOff, status: 'sent_back', conditions: null, note: 'Raise the pH first.' };
const pending: ReviewSummary = { ...sentBack, status: 'pending', decidedBy: null, decidedAt: null };
const events: ReviewEvent[] = [
  { action: 'submitted', actor: theo, at: '2026-03-04T09:00:00.000Z', note: null },
  { action: 'signed_off', actor: sam, at: '2026-03-04T10:00:00.000Z', note: 'Fume hood on; second person present.' },
];

function inDark(ui: ReactElement) {
  return render(<ThemeContext.Provider value={buildTheme('dark', true)}>{ui}</ThemeContext.Provider>);
}

describe('formatEvidenceValue', () => {
  const cases: { name: string; value: Parameters<typeof formatEvidenceValue>[0]; unit?: string; text: string }[] = [
    { name: 'a fraction as percent', value: 0.14, unit: 'fraction', text: '14.0 %' },
    { name: 'a small fraction as percent', value: 0.0005, unit: 'fraction', text: '0.0500 %' },
    { name: 'a pH with no unit', value: 10, text: '10.0' },
    { name: 'mol/L at 3 significant figures', value: 0.123456, unit: 'mol/L', text: '0.123 mol/L' },
    { name: 'a very small value in exponent form', value: 1.234e-7, unit: 'mol/L', text: '1.23 × 10⁻⁷ mol/L' },
    { name: 'a very large value in exponent form', value: 2.5e7, text: '2.50 × 10⁷' },
    { name: 'a large value below a million', value: 123456, unit: 'mg/L', text: '123000 mg/L' },
    { name: 'zero', value: 0, unit: 'mol/L', text: '0 mol/L' },
    { name: 'a negative value', value: -0.00001, text: '-1.00 × 10⁻⁵' },
    { name: 'true as yes', value: true, text: 'yes' },
    { name: 'false as no', value: false, text: 'no' },
    { name: 'null as not known', value: null, unit: 'mol/L', text: 'not known' },
    { name: 'text as given, with its unit', value: 'above 12', unit: 'pH units', text: 'above 12 pH units' },
    { name: 'NaN as not known', value: Number.NaN, unit: 'mol/L', text: 'not known' },
    { name: 'an infinite fraction as not known', value: Number.POSITIVE_INFINITY, unit: 'fraction', text: 'not known' },
  ];
  it.each(cases)('$name', ({ value, unit, text }) => {
    expect(formatEvidenceValue(value, unit)).toBe(text);
  });

  it('ends each GHS statement with a full stop, once', () => {
    expect(ghsLine({ code: 'H300', text: 'Fatal if swallowed' })).toBe('H300 Fatal if swallowed.');
    expect(ghsLine({ code: 'H410', text: 'Very toxic to aquatic life.' })).toBe('H410 Very toxic to aquatic life.');
  });

  it('finds the worst severity', () => {
    expect(worstSeverity([])).toBeNull();
    expect(worstSeverity([cyanidePresent, ammoniaVapour])).toBe('caution');
    expect(worstSeverity(hazards)).toBe('danger');
  });
});

describe('GhsPictogram', () => {
  it.each(Object.keys(GHS_PICTOGRAMS) as GhsCode[])('%s is an image named by code and meaning', (code) => {
    render(<GhsPictogram code={code} size={28} />);
    const image = screen.getByLabelText(`${code}: ${GHS_PICTOGRAMS[code]}`);
    expect(image.props.accessibilityRole).toBe('image');
    expect(image.props.style).toEqual({ width: 28, height: 28 });
  });
});

describe('HazardBanner', () => {
  it('renders nothing when no rule fired', () => {
    render(<HazardBanner hazards={[]} review={signedOff} />);
    expect(screen.queryByTestId('hazard-banner')).toBeNull();
    expect(screen.toJSON()).toBeNull();
  });

  it('heads with the worst severity in words and shows every hazard with its evidence and statements', () => {
    render(<HazardBanner hazards={hazards} />);
    expect(screen.getByLabelText('Hazards')).toBeOnTheScreen();
    expect(screen.getByText('Danger · 3 hazards')).toBeOnTheScreen();
    for (const h of hazards) expect(within(screen.getByTestId(`hazard-${h.rule}`)).getByText(h.title, { exact: false })).toBeOnTheScreen();
    expect(screen.getByText('Caution: Step 2: Ammonia vapour')).toBeOnTheScreen();

    const low = within(screen.getByTestId('hazard-cyanide_low_ph'));
    expect(low.getByText('Danger:')).toBeOnTheScreen();
    expect(low.getByText('HCN share of free cyanide')).toBeOnTheScreen();
    expect(low.getByText('14.0 %')).toBeOnTheScreen();
    expect(low.getByText('2.00 %')).toBeOnTheScreen();
    expect(low.getByText('10.0')).toBeOnTheScreen();
    expect(low.getByText('not known')).toBeOnTheScreen();
    expect(low.getByText('engine speciation')).toBeOnTheScreen();
    expect(low.getByLabelText('GHS06: Acute toxicity (fatal or toxic)')).toBeOnTheScreen();

    const present = within(screen.getByTestId('hazard-cyanide_present'));
    expect(present.getByText('Caution:')).toBeOnTheScreen();
    expect(present.getByText('H300 Fatal if swallowed.')).toBeOnTheScreen();
    expect(present.getByText('GHS statements for NaCN')).toBeOnTheScreen();
    expect(present.getByText('0.900 mol/L')).toBeOnTheScreen();
  });

  it('says Caution when no hazard is a danger, and leaves out the desk note when nothing is flagged', () => {
    render(<HazardBanner hazards={[ammoniaVapour]} />);
    expect(screen.getByText('Caution · 1 hazard')).toBeOnTheScreen();
    expect(screen.queryByTestId('hazard-flag-note')).toBeNull();
  });

  const reviews: { name: string; review: ReviewSummary; lines: string[] }[] = [
    { name: 'signed off, with its conditions', review: signedOff, lines: ['Safety desk: Signed off', 'Conditions: Fume hood on; second person present.'] },
    { name: 'sent back, with its note', review: sentBack, lines: ['Safety desk: Sent back', 'Note: Raise the pH first.'] },
    { name: 'waiting', review: pending, lines: ['Waiting for the safety desk', 'Note: Raise the pH first.'] },
  ];
  it.each(reviews)('shows the flag and the review $name', ({ review, lines }) => {
    render(<HazardBanner hazards={hazards} review={review} />);
    expect(screen.getByTestId('hazard-flag-note')).toHaveTextContent('Flagged for the safety desk');
    for (const line of lines) expect(screen.getByText(line)).toBeOnTheScreen();
    if (review.decidedBy) expect(screen.getByText(/^Decided by Sam Reyes/)).toBeOnTheScreen();
    else expect(screen.queryByText(/^Decided by/)).toBeNull();
  });

  it('compact: titles only until the details are opened', () => {
    inDark(<HazardBanner hazards={hazards} review={signedOff} compact />);
    expect(screen.getByText('Danger: Cyanide below pH 11')).toBeOnTheScreen();
    expect(screen.queryByText('14.0 %')).toBeNull();
    expect(screen.queryByText(/^Conditions:/)).toBeNull();
    expect(screen.getByTestId('hazard-flag-note')).toBeOnTheScreen();

    const toggle = screen.getByRole('button', { name: 'Show details' });
    expect(toggle).toBeCollapsed();
    fireEvent.press(toggle);
    expect(screen.getByText('14.0 %')).toBeOnTheScreen();
    expect(screen.getByText('Conditions: Fume hood on; second person present.')).toBeOnTheScreen();
    const hide = screen.getByRole('button', { name: 'Hide details' });
    expect(hide).toBeExpanded();
    fireEvent.press(hide);
    expect(screen.queryByText('14.0 %')).toBeNull();
  });
});

describe('HazardChips', () => {
  it('has a short label for every rule', () => {
    expect(Object.keys(HAZARD_SHORT_LABELS).sort()).toEqual([...HAZARD_RULES].sort());
  });

  it('renders nothing with no hazards and no review', () => {
    render(<HazardChips hazards={[]} />);
    expect(screen.toJSON()).toBeNull();
  });

  it('shows one chip per rule, dangers first, with the severity in the accessible name', () => {
    render(<HazardChips hazards={[...hazards, { ...cyanidePresent, step: 3 }]} review={pending} />);
    const row = screen.getByTestId('hazard-chips');
    expect(within(row).getAllByText(/./).map((t) => t.props.children)).toEqual([
      'Low pH cyanide',
      'Cyanide',
      'Ammonia vapour',
      'Desk: waiting',
    ]);
    expect(screen.getByLabelText('Danger: Low pH cyanide')).toBeOnTheScreen();
    expect(screen.getByLabelText('Caution: Cyanide')).toBeOnTheScreen();
    expect(screen.getByLabelText('Caution: Ammonia vapour')).toBeOnTheScreen();
    expect(screen.getByLabelText('Safety desk: waiting')).toBeOnTheScreen();
  });

  it.each([
    [signedOff, 'Desk: signed off'],
    [sentBack, 'Desk: sent back'],
  ] as const)('shows the review chip alone when there is no hazard (%#)', (review, label) => {
    inDark(<HazardChips hazards={[]} review={review} />);
    expect(within(screen.getByTestId('hazard-chips')).getByText(label)).toBeOnTheScreen();
  });
});

describe('HazardSection', () => {
  it('writes out every hazard, the review and its history, and ends on the SDS line', () => {
    render(<HazardSection hazards={hazards} review={signedOff} events={events} />);
    expect(screen.getByRole('header', { name: 'Hazards and safety review' })).toBeOnTheScreen();
    const low = within(screen.getByTestId('print-hazard-cyanide_low_ph'));
    expect(low.getByText('DANGER: Cyanide below pH 11')).toBeOnTheScreen();
    expect(low.getByText(cyanideLowPh.text)).toBeOnTheScreen();
    expect(low.getByText('14.0 %')).toBeOnTheScreen();
    expect(low.getByText('H330 Fatal if inhaled.')).toBeOnTheScreen();
    expect(low.getByText('Source: pKa 9.21 (a named handbook, from memory)')).toBeOnTheScreen();
    expect(screen.getByText('CAUTION: Step 2: Ammonia vapour')).toBeOnTheScreen();
    expect(screen.getByText('Flagged for the safety desk')).toBeOnTheScreen();
    expect(screen.getByText('Safety desk: Signed off')).toBeOnTheScreen();
    expect(screen.getByText('Conditions: Fume hood on; second person present.')).toBeOnTheScreen();

    const history = screen.getAllByTestId('print-review-event');
    expect(history).toHaveLength(2);
    expect(within(history[0]!).getByText(/^Submitted by Theo Bench, /)).toBeOnTheScreen();
    expect(within(history[1]!).getByText(/^Signed off by Sam Reyes, /)).toBeOnTheScreen();
    expect(within(history[1]!).getByText('Fume hood on; second person present.')).toBeOnTheScreen();

    expect(screen.getByText(DEFER_TO_SDS)).toBeOnTheScreen();
    expect(screen.queryByRole('button')).toBeNull();
  });

  it('says no rule fired, still with the SDS line', () => {
    render(<HazardSection hazards={[]} />);
    expect(screen.getByText('No hazard rule fired for this work.')).toBeOnTheScreen();
    expect(screen.getByText(DEFER_TO_SDS)).toBeOnTheScreen();
    expect(screen.queryByTestId('print-review')).toBeNull();
  });
});
