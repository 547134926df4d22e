#!/bin/sh
# Use from a script with curl: compute a line (no sign-in needed), then list approved line types with a token.
#   LINEWRIGHT_TOKEN=lwt_… sh examples/calculate.sh
set -eu
URL="${LINEWRIGHT_URL:-http://127.0.0.1:3000}"
curl -sf "$URL/api/v1/calculate" -H 'content-type: application/json' \
  -d '{"spec":{"kind":"microstrip","w":"0.3 mm","h":"0.17 mm","t":"1 oz","er":4.2}}'
echo
curl -sf "$URL/api/v1/line-types?state=approved" -H "authorization: Bearer $LINEWRIGHT_TOKEN"
echo
