#!/usr/bin/env bash
# npm run restore -- DIR [--force]: a backup folder into a fresh database and bucket, then checked
# table by table and object by object. Refuses a database or bucket that is not empty without --force.
set -euo pipefail
source "$(dirname "$0")/lib/backup-env.sh"
node_modules/.bin/tsx scripts/backup/restore.ts "$@"
