import { Users1796164334224 } from './1796164334224-users';
import { HuntsScansKeepers1796164796469 } from './1796164796469-hunts-scans-keepers';
import { ScansBestFindIndex1796166184105 } from './1796166184105-scans-best-find-index';
import { PhotosSharesInvites1796168284344 } from './1796168284344-photos-shares-invites';
import { RoundTwoFields1796189636687 } from './1796189636687-round-two-fields';

// Listed as classes in order; a new migration is generated with `npm run db:generate -- <name>` and added here.
export const migrations = [Users1796164334224, HuntsScansKeepers1796164796469, ScansBestFindIndex1796166184105, PhotosSharesInvites1796168284344, RoundTwoFields1796189636687];
