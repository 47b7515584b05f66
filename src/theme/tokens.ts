/** Scales shared by every screen; t-shirt keys so a size reads the same everywhere. */
export const space = { xxs: 2, xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;

export const radius = { sm: 6, md: 10, lg: 16, pill: 999 } as const;

export const fontSize = { xs: 12, sm: 14, md: 16, lg: 20, xl: 26, xxl: 34, display: 44 } as const;

export const fonts = {
  mono: 'IBMPlexMono_400Regular',
  monoMedium: 'IBMPlexMono_500Medium',
  monoBold: 'IBMPlexMono_600SemiBold',
  // The system face for prose keeps the page calm; digits get the mono face.
  body: 'System',
} as const;

/** A thumb can hit keys this big without looking (Product brief: at least 56 px). */
export const touch = { key: 64, minimum: 44 } as const;

export const breakpoints = { tablet: 600, desktop: 900, wide: 1200 } as const;
