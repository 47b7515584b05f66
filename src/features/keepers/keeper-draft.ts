import { updateKeeperRequest, type KeeperStatus, type KeeperSummary, type UpdateKeeperRequest } from '@shared/contracts';
import { parseSerial } from '@shared/engine';
import { centsToInput, parseDollars } from '@/lib/money';
import { flatFieldErrors } from '@shared/contracts/field-errors';

/** What the keeper form holds: text as typed, so nothing half-entered is lost on a failed save. */
export interface KeeperDraft {
  serial: string;
  series: string;
  district: string;
  facility: '' | 'DC' | 'FW';
  star: boolean;
  denomination: number | null;
  grade: string;
  /** Our own yes/no (never pressed, washed or repaired); '' when not judged. */
  originalPaper: '' | 'yes' | 'no';
  /** For a star note: the run size looked up, as typed. */
  starRunSize: string;
  value: string;
  status: KeeperStatus;
  notes: string;
}

export const emptyKeeperDraft: KeeperDraft = {
  serial: '',
  series: '',
  district: '',
  facility: '',
  star: false,
  denomination: 1,
  grade: '',
  originalPaper: '',
  starRunSize: '',
  value: '',
  status: 'kept',
  notes: '',
};

export function keeperToDraft(keeper: KeeperSummary): KeeperDraft {
  return {
    serial: keeper.serial,
    series: keeper.series ?? '',
    district: keeper.district ?? '',
    facility: keeper.facility ?? '',
    star: keeper.star,
    denomination: keeper.denomination,
    grade: keeper.grade == null ? '' : String(keeper.grade),
    originalPaper: keeper.originalPaper == null ? '' : keeper.originalPaper ? 'yes' : 'no',
    starRunSize: keeper.starRunSize == null ? '' : String(keeper.starRunSize),
    value: centsToInput(keeper.estimatedValueCents),
    status: keeper.status,
    notes: keeper.notes ?? '',
  };
}

export type DraftCheck = { ok: true; body: UpdateKeeperRequest & { serial: string } } | { ok: false; fields: Record<string, string> };

/** Checks the form with the engine's parser and the shared contract before anything is sent. */
export function checkKeeperDraft(draft: KeeperDraft): DraftCheck {
  const fields: Record<string, string> = {};
  const parsedSerial = parseSerial(draft.serial);
  if (!parsedSerial.ok) fields.serial = parsedSerial.error.message;
  const money = parseDollars(draft.value);
  if (!money.ok) fields.estimatedValueCents = money.error;
  const grade = draft.grade.trim() === '' ? null : Number(draft.grade);
  const runText = draft.starRunSize.replace(/[\s,._]/g, '');
  const starRunSize = !draft.star || runText === '' ? null : /^\d+$/.test(runText) ? Number(runText) : Number.NaN;
  const candidate = {
    serial: draft.serial.trim(),
    series: draft.series.trim() || null,
    district: draft.district.trim() || null,
    facility: draft.facility || null,
    star: draft.star,
    denomination: draft.denomination,
    grade,
    originalPaper: draft.originalPaper === '' ? null : draft.originalPaper === 'yes',
    starRunSize,
    estimatedValueCents: money.ok ? money.cents : null,
    status: draft.status,
    notes: draft.notes.trim() || null,
  };
  const parsed = updateKeeperRequest.safeParse(candidate);
  if (!parsed.success) for (const [field, message] of Object.entries(flatFieldErrors(parsed.error))) fields[field] ??= message;
  if (Object.keys(fields).length || !parsed.success) return { ok: false, fields };
  return { ok: true, body: { ...parsed.data, serial: candidate.serial } };
}
