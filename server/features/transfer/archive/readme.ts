/** The README inside every archive: what each file is, for a person opening the zip years from now. */
export const ARCHIVE_README_TEXT = `Strapsift archive
=================

This zip holds everything one Strapsift account kept, so it can be read without Strapsift or brought
back into it (You > Restore from an archive) on this server or another.

strapsift.json
  One JSON object, format "strapsift-archive", version 1. In order:
  - account: the e-mail and display name the archive was made for (profile settings)
  - exportedAt: when the archive was made (UTC)
  - weightTables: each named weight table with every weight, and which one was active
  - watchPatterns: the personal watch patterns, in the syntax the Odds screen shows
  - hunts: every hunt you were in, with its straps (swapped in, short or over, note), your role
    and the others in its crew
  - notes: every note you logged: the serial as entered, star, strap, pulled, time, how it was
    entered (keypad or camera, with the camera's confidence), and the patterns and points it got
  - keepers: every kept note with all its fields (grade, value, status, notes...)
  - photos: one line per photo file below, with its size and SHA-256 checksum
  Times are ISO 8601 in UTC; money is in whole cents; ids are UUIDs, kept on restore so nothing
  is counted twice.

photos/<keeper id>-<front|back>.<jpg|png|webp>
  The keeper photos exactly as Strapsift stored them (already stripped of camera and location data).

README.txt
  This file.
`;
