import type { DataSource } from 'typeorm';
import { config } from './config';
import { AdminService } from './features/admin/admin.service';
import { AuthService } from './features/auth/auth.service';
import { PasswordResetService } from './features/auth/password-reset.service';
import { InMemoryResetOutbox, type ResetMailer } from './features/auth/reset-mailer';
import { CrewService } from './features/crew/crew.service';
import { HuntsService } from './features/hunts/hunts.service';
import { KeepersService } from './features/keepers/keepers.service';
import { ScansService } from './features/scans/scans.service';
import { StrapsService } from './features/straps/straps.service';
import { TallyService } from './features/tally/tally.service';
import { UsersService } from './features/users/users.service';
import { WatchService } from './features/watch/watch.service';
import { WeightsService } from './features/weights/weights.service';

export interface ServiceOptions {
  /** Where password-reset messages go; an in-memory outbox until the mail issue brings SMTP. */
  resetMailer?: ResetMailer;
}

/** One instance of each service per app, wired here so routes stay thin and tests can build the whole set. */
export function createServices(dataSource: DataSource, options: ServiceOptions = {}) {
  const auth = new AuthService(dataSource);
  const users = new UsersService(dataSource);
  const weights = new WeightsService(dataSource);
  const resetMailer = options.resetMailer ?? new InMemoryResetOutbox(100, config().NODE_ENV === 'development');
  const passwordReset = new PasswordResetService(dataSource, auth, resetMailer, () => config().PUBLIC_URL);
  const hunts = new HuntsService(dataSource, weights);
  const crew = new CrewService(dataSource);
  const straps = new StrapsService(dataSource);
  const scans = new ScansService(dataSource, weights);
  const tally = new TallyService(dataSource, weights);
  const keepers = new KeepersService(dataSource, weights);
  const watch = new WatchService(dataSource);
  const admin = new AdminService(dataSource);

  // Every new account starts with the engine's default weight table, active.
  auth.onRegister((user) => weights.ensureDefault(user.id));
  // Shared hunts outlive their owner's account, so the crew's notes are not deleted with it.
  users.onBeforeDelete((userId) => crew.handOverHunts(userId));

  return { auth, users, weights, passwordReset, resetMailer, hunts, crew, straps, scans, tally, keepers, watch, admin };
}

export type Services = ReturnType<typeof createServices>;
