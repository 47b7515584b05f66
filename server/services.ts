import type { DataSource } from 'typeorm';
import { config } from './config';
import { AdminService } from './features/admin/admin.service';
import { AuthService } from './features/auth/auth.service';
import { PasswordResetService } from './features/auth/password-reset.service';
import { SmtpResetMailer } from './features/auth/reset-mail';
import type { ResetMailer } from './features/auth/reset-mailer';
import { SessionsService } from './features/auth/sessions.service';
import { CrewService } from './features/crew/crew.service';
import { InvitesService } from './features/crew/invites.service';
import { HuntSummaryService } from './features/hunts/hunt-summary';
import { HuntsService } from './features/hunts/hunts.service';
import { KeepersService } from './features/keepers/keepers.service';
import { PhotosService } from './features/photos/photos.service';
import { ScansService } from './features/scans/scans.service';
import { ShareService } from './features/share/share.service';
import { StrapsService } from './features/straps/straps.service';
import { TallyService } from './features/tally/tally.service';
import { ArchiveExportService } from './features/transfer/archive-export.service';
import { ArchiveImportService } from './features/transfer/archive-import.service';
import { ExportService } from './features/transfer/export.service';
import { ImportService } from './features/transfer/import.service';
import { UsersService } from './features/users/users.service';
import { WatchService } from './features/watch/watch.service';
import { WeightsService } from './features/weights/weights.service';
import { createSmtpMailer, type Mailer } from './lib/mail';
import { createObjectStore, type ObjectStore } from './lib/object-store';
import { createLimits, type Limits } from './lib/rate-limit';

export interface ServiceOptions {
  /** Where every mail goes; by default SMTP as configured (locally the mail catcher). */
  mailer?: Mailer;
  /** Where password-reset messages go; by default rendered and sent through `mailer`. */
  resetMailer?: ResetMailer;
  /** Where photo bytes go; by default S3 as configured (locally the s3rver fake). */
  objectStore?: ObjectStore;
  /** The shared rate limits (scans a day per user); by default the standard ones. */
  limits?: Limits;
}

/** One instance of each service per app, wired here so routes stay thin and tests can build the whole set. */
export function createServices(dataSource: DataSource, options: ServiceOptions = {}) {
  const sessions = new SessionsService(dataSource);
  const limits = options.limits ?? createLimits(dataSource);
  const auth = new AuthService(dataSource, sessions);
  const weights = new WeightsService(dataSource);
  const publicUrl = () => config().PUBLIC_URL;
  const mailer = options.mailer ?? createSmtpMailer(config());
  const objectStore = options.objectStore ?? createObjectStore(config());
  const resetMailer = options.resetMailer ?? new SmtpResetMailer(mailer);
  const passwordReset = new PasswordResetService(dataSource, auth, resetMailer, publicUrl, sessions);
  const users = new UsersService(dataSource, sessions, mailer, publicUrl, () => passwordReset);
  const hunts = new HuntsService(dataSource, weights);
  const crew = new CrewService(dataSource);
  const straps = new StrapsService(dataSource);
  const scans = new ScansService(dataSource, weights);
  const tally = new TallyService(dataSource, weights);
  const photos = new PhotosService(dataSource, objectStore);
  const keepers = new KeepersService(dataSource, weights, photos);
  const watch = new WatchService(dataSource);
  const admin = new AdminService(dataSource);
  const share = new ShareService(dataSource, photos, publicUrl);
  const invites = new InvitesService(dataSource, mailer, publicUrl);
  const huntSummary = new HuntSummaryService(dataSource, hunts, tally, mailer, publicUrl);
  const exporter = new ExportService(dataSource);
  // An EntityManager answers the same query/getRepository calls as a DataSource, so these copies of the
  // services write inside the import's transaction (one part of an import goes in whole or not at all).
  const importer = new ImportService(dataSource, (manager) => {
    const scoped = manager as unknown as DataSource;
    return { scans: new ScansService(scoped, weights), keepers: new KeepersService(scoped, weights, photos) };
  });
  const archives = { exporter: new ArchiveExportService(dataSource, objectStore), importer: new ArchiveImportService(dataSource, objectStore) };

  // Every new account starts with the engine's default weight table, active.
  auth.onRegister((user) => weights.ensureDefault(user.id));
  // Shared hunts outlive their owner's account, so the crew's notes are not deleted with it.
  users.onBeforeDelete((userId) => crew.handOverHunts(userId));
  // Photo bytes live outside PostgreSQL: they go from the object store before their rows cascade away.
  users.onBeforeDelete(async (userId) => {
    await photos.removeAllForUser(userId);
  });
  keepers.onBeforeRemove((userId, keeperId) => photos.removeForKeeper(userId, keeperId));

  return {
    limits,
    sessions,
    auth,
    users,
    weights,
    passwordReset,
    resetMailer,
    mailer,
    objectStore,
    hunts,
    crew,
    invites,
    huntSummary,
    straps,
    scans,
    tally,
    keepers,
    photos,
    share,
    exporter,
    importer,
    archives,
    watch,
    admin,
  };
}

export type Services = ReturnType<typeof createServices>;
