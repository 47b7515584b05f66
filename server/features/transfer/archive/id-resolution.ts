import type { EntityManager } from 'typeorm';
import { v5 as uuidV5 } from 'uuid';

/** Namespace of ids a restore derives when an archive's id is taken on this server (a fixed random UUID). */
const RESTORE_NAMESPACE = 'b6a0f3d1-52c4-4e8b-9d37-0f1e6a2c8b54';

/**
 * The id a record takes in the importer's account when its own id belongs to someone else here (the
 * same archive restored into a second account while the first still exists). Derived from both, so a
 * second restore lands on the same id and adds nothing.
 */
export const derivedId = (userId: string, id: string) => uuidV5(`${userId}|${id}`, RESTORE_NAMESPACE);

export interface Resolved {
  /** The id the record has (or will have) in the importer's account. */
  id: string;
  /** Already there: a restore leaves it alone. */
  present: boolean;
}

/**
 * Where each of a batch of notes or keepers goes: its own id when that is free or already the
 * importer's, else the derived id. Ids are kept wherever they can be, so notes keep their client ids.
 */
export async function resolveOwned(manager: EntityManager, table: 'scans' | 'keepers', userId: string, ids: readonly string[]): Promise<Map<string, Resolved>> {
  const derived = ids.map((id) => derivedId(userId, id));
  const rows: Array<{ id: string; user_id: string }> = await manager.query(`SELECT id, user_id FROM ${table} WHERE id = ANY($1::uuid[])`, [[...ids, ...derived]]);
  const owner = new Map(rows.map((row) => [row.id, row.user_id]));
  const resolved = new Map<string, Resolved>();
  ids.forEach((id, i) => {
    const other = derived[i]!;
    if (owner.get(id) === userId) resolved.set(id, { id, present: true });
    else if (owner.get(other) === userId) resolved.set(id, { id: other, present: true });
    else if (!owner.has(id)) resolved.set(id, { id, present: false });
    else resolved.set(id, { id: other, present: false });
  });
  return resolved;
}

export interface ResolvedHunt extends Resolved {
  /** Why a hunt comes back as the importer's own rather than as it was: null when it is simply theirs. */
  adopted: 'crew' | 'owned-here' | null;
}

/**
 * Where each hunt goes. A hunt the importer is already in is reused; one that is gone comes back with its
 * own id, owned by the importer; one that someone else owns here now (the exporter's old account handed
 * it to its crew, say) comes back as a copy under a derived id, also the importer's own.
 */
export async function resolveHunts(
  manager: EntityManager,
  userId: string,
  hunts: ReadonlyArray<{ id: string; role: 'owner' | 'crew' }>,
): Promise<Map<string, ResolvedHunt>> {
  const ids = hunts.map((hunt) => hunt.id);
  const derived = ids.map((id) => derivedId(userId, id));
  const rows: Array<{ id: string; member: boolean }> = await manager.query(
    `SELECT h.id, EXISTS (SELECT 1 FROM hunt_members m WHERE m.hunt_id = h.id AND m.user_id = $2) AS member
       FROM hunts h WHERE h.id = ANY($1::uuid[])`,
    [[...ids, ...derived], userId],
  );
  const found = new Map(rows.map((row) => [row.id, row.member]));
  const resolved = new Map<string, ResolvedHunt>();
  hunts.forEach((hunt, i) => {
    const other = derived[i]!;
    if (found.get(hunt.id) === true) resolved.set(hunt.id, { id: hunt.id, present: true, adopted: null });
    else if (found.get(other) === true) resolved.set(hunt.id, { id: other, present: true, adopted: null });
    else if (!found.has(hunt.id)) resolved.set(hunt.id, { id: hunt.id, present: false, adopted: hunt.role === 'crew' ? 'crew' : null });
    else resolved.set(hunt.id, { id: other, present: false, adopted: 'owned-here' });
  });
  return resolved;
}
