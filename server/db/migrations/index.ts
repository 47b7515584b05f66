export const migrations = [];
