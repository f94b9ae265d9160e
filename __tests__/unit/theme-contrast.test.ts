import { palettes, type Palette } from '@/components/theme/tokens';

// WCAG 2.2 relative luminance and contrast ratio (W3C, "Web Content Accessibility Guidelines 2.2", 1.4.3).
function luminance(hex: string): number {
  const n = parseInt(hex.slice(1), 16);
  const channel = (v: number) => {
    const s = v / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * channel((n >> 16) & 255) + 0.7152 * channel((n >> 8) & 255) + 0.0722 * channel(n & 255);
}

function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

// Text/background pairs the screens use; 4.5:1 is the WCAG AA minimum for body text.
const PAIRS: Array<[keyof Palette, keyof Palette]> = [
  ['text', 'background'],
  ['text', 'surface'],
  ['textMuted', 'background'],
  ['textMuted', 'surface'],
  ['primary', 'surface'],
  ['onPrimary', 'primary'],
  ['caution', 'cautionSoft'],
  ['danger', 'dangerSoft'],
  ['ok', 'okSoft'],
  ['onRail', 'rail'],
  ['onRailMuted', 'rail'],
  ['onRail', 'railActive'],
];

describe.each(Object.entries(palettes))('%s palette', (_name, palette) => {
  it.each(PAIRS)('%s on %s meets WCAG AA (4.5:1)', (fg, bg) => {
    expect(contrast(palette[fg], palette[bg])).toBeGreaterThanOrEqual(4.5);
  });

  it('uses only #RRGGBB values', () => {
    for (const value of Object.values(palette)) expect(value).toMatch(/^#[0-9A-F]{6}$/);
  });
});
