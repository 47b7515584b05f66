#!/usr/bin/env bash
# Generates a migration from the entities: npm run db:generate -- <name>
set -euo pipefail
name="${1:?usage: npm run db:generate -- <migration-name>}"
node --import tsx node_modules/typeorm/cli.js migration:generate "server/db/migrations/$name" -p -d server/db/data-source.ts
echo "Now add the new class to server/db/migrations/index.ts" >&2
