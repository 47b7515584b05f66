import type { PublicUser } from '../../../shared/contracts/auth';
import type { UserEntity } from './user.entity';

/** The only shape a user leaves the server in: never the hash, never the token version. */
export function toPublicUser(user: UserEntity): PublicUser {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    createdAt: user.createdAt.toISOString(),
  };
}
