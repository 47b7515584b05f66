import { AuthSessionEntity } from '../features/auth/auth-session.entity';
import { PasswordResetTokenEntity } from '../features/auth/password-reset-token.entity';
import { CrewInviteEntity } from '../features/crew/crew-invite.entity';
import { HuntMemberEntity } from '../features/crew/hunt-member.entity';
import { HuntEntity } from '../features/hunts/hunt.entity';
import { KeeperEntity } from '../features/keepers/keeper.entity';
import { PhotoEntity } from '../features/photos/photo.entity';
import { ScanTombstoneEntity } from '../features/scans/scan-tombstone.entity';
import { ScanEntity } from '../features/scans/scan.entity';
import { ShareLinkEntity } from '../features/share/share-link.entity';
import { StrapEntity } from '../features/straps/strap.entity';
import { EmailChangeEntity } from '../features/users/email-change.entity';
import { UserEntity } from '../features/users/user.entity';
import { WatchPatternEntity } from '../features/watch/watch-pattern.entity';
import { WeightTableEntity } from '../features/weights/weight-table.entity';

// Listed as classes, not globs: globs break under vitest and the bundler-style resolution.
export const entities = [
  UserEntity,
  HuntEntity,
  HuntMemberEntity,
  StrapEntity,
  ScanEntity,
  ScanTombstoneEntity,
  KeeperEntity,
  WeightTableEntity,
  WatchPatternEntity,
  PasswordResetTokenEntity,
  PhotoEntity,
  ShareLinkEntity,
  CrewInviteEntity,
  AuthSessionEntity,
  EmailChangeEntity,
];
