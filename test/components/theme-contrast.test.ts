import Color from 'color';
import { describe, expect, it } from 'vitest';
import { darkTheme, lightTheme, type Theme } from '../../src/theme/themes';

// WCAG 2.1 success criterion 1.4.3: 4.5:1 for normal text, 3:1 for large text and UI parts.
// Ratios come from the `color` package's WCAG contrast, not from our own formula.
const AA_TEXT = 4.5;
const AA_LARGE = 3;

type Role = keyof Omit<Theme, 'name'>;
const TEXT_PAIRS: [Role, Role][] = [
  ['ink', 'surface'],
  ['ink', 'surfaceRaised'],
  ['ink', 'surfaceSunken'],
  ['inkMuted', 'surface'],
  ['inkMuted', 'surfaceRaised'],
  ['inkMuted', 'surfaceSunken'],
  ['inkFaint', 'surface'],
  ['inkFaint', 'surfaceRaised'],
  ['hit', 'surface'],
  ['hit', 'surfaceRaised'],
  ['hit', 'hitSoft'],
  ['onHit', 'hit'],
  ['onBrand', 'brand'],
  ['brand', 'surface'],
  ['brand', 'surfaceRaised'],
  ['near', 'surface'],
  ['near', 'surfaceRaised'],
  ['near', 'nearSoft'],
  ['danger', 'surface'],
  ['danger', 'surfaceRaised'],
  ['ok', 'surface'],
  ['ok', 'surfaceSunken'],
  ['warn', 'surface'],
  ['warn', 'surfaceSunken'],
];

describe.each([lightTheme, darkTheme])('the $name theme', (theme) => {
  it.each(TEXT_PAIRS)('when %s text sits on %s, then the contrast meets WCAG AA for normal text', (fg, bg) => {
    expect(Color(theme[fg]).contrast(Color(theme[bg]))).toBeGreaterThanOrEqual(AA_TEXT);
  });

  it('when a focus ring or an input border is drawn, then it stands out from the page by at least 3:1', () => {
    expect(Color(theme.focus).contrast(Color(theme.surface))).toBeGreaterThanOrEqual(AA_LARGE);
  });
});
