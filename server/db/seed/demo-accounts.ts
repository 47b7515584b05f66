// Invented people for the demo; the README shows these sign-ins.
export const DEMO_COLLECTOR = {
  email: 'demo@strapsift.test',
  password: 'sift-demo-2026',
  displayName: 'Wren Halloway',
} as const;

export const DEMO_ADMIN = {
  email: 'admin@strapsift.test',
  password: 'console-demo-2026',
  displayName: 'Ostin Pell',
} as const;

/** Sifts half of a shared brick with the collector, so the crew view has someone in it. */
export const DEMO_CREW = {
  email: 'crew@strapsift.test',
  password: 'crew-demo-2026',
  displayName: 'Tobiah Marsh',
} as const;
