/**
 * Use from a script: sign in with a personal API token, list the team's
 * approved line types, and sweep the first one's width ±20 % around its
 * catalog value.
 *
 *   LINEWRIGHT_URL=http://127.0.0.1:3000 LINEWRIGHT_TOKEN=lwt_… npx tsx examples/approved-line-sweep.ts
 */

export interface ExampleOptions {
  baseUrl: string;
  token: string;
  log?: (line: string) => void;
}

/** JSON as the API answers it; the OpenAPI file documents each shape. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Json = any;

async function call(options: ExampleOptions, path: string, body?: unknown): Promise<Json> {
  const response = await fetch(`${options.baseUrl}/api/v1${path}`, {
    method: body === undefined ? 'GET' : 'POST',
    headers: { authorization: `Bearer ${options.token}`, 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const answer: Json = await response.json();
  if (!response.ok) throw new Error(`${path}: ${response.status} ${answer.detail ?? answer.title}`);
  return answer;
}

export async function approvedLineSweep(options: ExampleOptions) {
  const log = options.log ?? console.log;
  const list = await call(options, '/line-types?state=approved&sort=name');
  for (const lineType of list.items) log(`${lineType.name.padEnd(36)} ${lineType.kind.padEnd(20)} target ${lineType.target.quantity} ${lineType.target.value} Ω`);

  const first = await call(options, `/line-types/${list.items[0].id}`);
  const { spec } = first.computed;
  const sweep = await call(options, '/sweep', { spec, field: 'w', from: spec.w * 0.8, to: spec.w * 1.2, points: 5 });
  const impedance = sweep.series.zDiff ?? sweep.series.z0;
  log(`\n${first.name}: width sweep`);
  sweep.x.forEach((width: number, index: number) => log(`  w = ${(width * 1e3).toFixed(3)} mm → ${impedance[index].toFixed(2)} Ω`));
  log(`\n${sweep.note}`);
  return { lineTypes: list.items.length, widths: sweep.x as number[], impedance: impedance as number[] };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const token = process.env['LINEWRIGHT_TOKEN'];
  if (!token) {
    console.error('Set LINEWRIGHT_TOKEN to a personal API token (create one under Account → API tokens, or POST /api/v1/tokens).');
    process.exit(2);
  }
  await approvedLineSweep({ baseUrl: process.env['LINEWRIGHT_URL'] ?? 'http://127.0.0.1:3000', token });
}
