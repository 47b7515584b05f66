import { Users1796164334224 } from './1796164334224-users';

// Listed as classes in order; a new migration is generated with `npm run db:generate -- <name>` and added here.
export const migrations = [Users1796164334224];
