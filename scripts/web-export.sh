#!/usr/bin/env bash
# Builds the web app into dist/ (Expo's own export), then adds what the service worker needs.
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"
say "building the web app (expo export)"
rm -rf dist
CI=1 node_modules/.bin/expo export --platform web --output-dir dist >"$DATA_DIR/export.log" 2>&1 \
  || { tail -40 "$DATA_DIR/export.log" >&2; die "expo export failed; see .data/export.log"; }
if [ -f scripts/web/after-export.ts ]; then
  node_modules/.bin/tsx scripts/web/after-export.ts dist || die "post-export step failed"
fi
touch dist/.strapsift-export
