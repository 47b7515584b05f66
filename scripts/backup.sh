#!/usr/bin/env bash
# npm run backup: pg_dump of the database plus a copy of the photo bucket into .data/backups/<timestamp>/.
# BACKUP_KEEP (7) folders are kept; BACKUP_DIR moves them. See docs/OPERATIONS.md.
set -euo pipefail
source "$(dirname "$0")/lib/backup-env.sh"
node_modules/.bin/tsx scripts/backup/backup.ts "$@"
