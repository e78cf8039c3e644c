#!/usr/bin/env bash
# Schema and migrations agree: drizzle-kit's own consistency check of drizzle/, then a generate into a
# copy of drizzle/ that must find nothing to write (a change to db/ without its migration fails here).
set -euo pipefail
cd "$(dirname "$0")/.."
npx drizzle-kit check --dialect postgresql --out ./drizzle
# drizzle-kit wants a relative --out; .data/ is git-ignored.
mkdir -p .data
tmp=$(mktemp -d .data/db-check-XXXXXX)
trap 'rm -rf "$tmp"' EXIT
cp -r drizzle "$tmp/drizzle"
before=$(ls "$tmp/drizzle" | wc -l)
npx drizzle-kit generate --dialect postgresql --schema ./db/schema.ts --out "./$tmp/drizzle" >"$tmp/log" 2>&1 || { cat "$tmp/log"; exit 1; }
if grep -qi "error" "$tmp/log"; then cat "$tmp/log"; exit 1; fi
after=$(ls "$tmp/drizzle" | wc -l)
if [ "$after" -ne "$before" ]; then
  echo "db/ has changes with no migration: run npm run db:generate -- --name what-changed"
  exit 1
fi
echo "schema and migrations agree"
