#!/usr/bin/env bash
# Fails when web/src/lib/api-schema.d.ts no longer matches the API's OpenAPI document.
# Needs api/dist (npm run build -w api). Regenerate with: npm run openapi
set -euo pipefail
ROOT="$(cd "$(dirname "$0")/.." && pwd)"
cd "$ROOT"
doc="$(mktemp -d)/openapi.json"
node api/dist/openapi/write-openapi-document.js "$doc" >/dev/null
if ! npx openapi-typescript "$doc" -o web/src/lib/api-schema.d.ts --default-non-nullable false --check; then
  echo "web/src/lib/api-schema.d.ts is stale: the API's contract changed. Run 'npm run openapi' and commit the result." >&2
  exit 1
fi
echo "web/src/lib/api-schema.d.ts matches the API's OpenAPI document."
