import type { LineSpec } from '@linewright/lines';

/** The calculate request a script would send for `spec`, as JSON and as a curl command. */
export function apiRequest(spec: LineSpec, origin: string): { json: string; curl: string } {
  const json = JSON.stringify({ spec }, null, 2);
  const compact = JSON.stringify({ spec });
  // Single quotes inside the body would end the shell string; JSON from numbers and kind names has none, but escape anyway.
  const quoted = compact.replaceAll("'", "'\\''");
  return {
    json,
    curl: `curl -s ${origin}/api/v1/calculate \\\n  -H 'content-type: application/json' \\\n  -d '${quoted}'`,
  };
}
