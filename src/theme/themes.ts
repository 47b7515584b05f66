/**
 * Roles, not colours: screens ask for "hit" or "near", never for a hex value.
 * Light is paper and ink; dark is graphite. The hit accent is a deep vermilion and the
 * near-miss accent a quieter slate blue, both checked for AA contrast on their surfaces.
 */
export interface Theme {
  name: 'light' | 'dark';
  surface: string;
  surfaceRaised: string;
  surfaceSunken: string;
  ink: string;
  inkMuted: string;
  inkFaint: string;
  line: string;
  brand: string;
  onBrand: string;
  hit: string;
  onHit: string;
  hitSoft: string;
  near: string;
  nearSoft: string;
  ok: string;
  warn: string;
  danger: string;
  focus: string;
}

export const lightTheme: Theme = {
  name: 'light',
  surface: '#F5F1E8',
  surfaceRaised: '#FFFDF8',
  surfaceSunken: '#ECE6D8',
  ink: '#1E2320',
  inkMuted: '#4F5752',
  inkFaint: '#666B65',
  line: '#D8D0BE',
  brand: '#2F4A3A',
  onBrand: '#F5F1E8',
  hit: '#B23A1E',
  onHit: '#FFFFFF',
  hitSoft: '#F6DDD3',
  near: '#3F5C86',
  nearSoft: '#DEE6F1',
  ok: '#2E6B45',
  warn: '#8A5A00',
  danger: '#A32020',
  focus: '#3F5C86',
};

export const darkTheme: Theme = {
  name: 'dark',
  surface: '#15181A',
  surfaceRaised: '#1E2225',
  surfaceSunken: '#0F1113',
  ink: '#ECE7DC',
  inkMuted: '#B9B4A9',
  inkFaint: '#8F8B83',
  line: '#33393D',
  brand: '#8DB59B',
  onBrand: '#10140F',
  hit: '#F2825E',
  onHit: '#1A0D08',
  hitSoft: '#3B2219',
  near: '#93AEDB',
  nearSoft: '#1F2A3A',
  ok: '#7CC492',
  warn: '#E0B457',
  danger: '#F08080',
  focus: '#93AEDB',
};
