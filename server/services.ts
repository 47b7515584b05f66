import type { DataSource } from 'typeorm';
import { AuthService } from './features/auth/auth.service';
import { UsersService } from './features/users/users.service';

/** One instance of each service per app, wired here so routes stay thin and tests can build the whole set. */
export function createServices(dataSource: DataSource) {
  const auth = new AuthService(dataSource);
  const users = new UsersService(dataSource);
  return { auth, users };
}

export type Services = ReturnType<typeof createServices>;
