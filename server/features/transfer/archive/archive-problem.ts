import { HttpError } from '../../../lib/errors';

/** Something wrong with an uploaded archive, and where: the restore answers 400 and changes nothing. */
export class ArchiveProblem extends Error {
  constructor(
    readonly where: string,
    message: string,
  ) {
    super(message);
  }
}

export interface ProblemView {
  where: string;
  message: string;
}

/** At most this many problems are listed: a broken file can have one per note. */
export const MAX_PROBLEMS = 50;

/** The 400 a restore answers for a bad archive: the first problem as the message, all of them as fields. */
export function badArchive(problems: readonly ProblemView[]): HttpError {
  const first = problems[0];
  const fields: Record<string, string> = {};
  for (const problem of problems) fields[problem.where] ??= problem.message;
  return new HttpError(400, 'bad_archive', `This archive cannot be restored: ${first ? `${first.where}: ${first.message}` : 'it is damaged'}`, fields);
}
