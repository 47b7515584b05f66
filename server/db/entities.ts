import { UserEntity } from '../features/users/user.entity';

// Listed as classes, not globs: globs break under vitest and the bundler-style resolution.
export const entities = [UserEntity];
