// `npm run -s cli -- VERB ...`: one JSON document on stdout, exit 0; bad input exits 2 with
// {"error": {"message", "where"}} on stderr. bigints are printed as strings so no digit is lost.
import { NinefoldError } from '../exact/errors.ts';
import { argsParse } from './args.ts';
import { VERBS } from './verbs.ts';

export function jsonText(value: unknown): string {
  return JSON.stringify(value, (_k, v) => (typeof v === 'bigint' ? v.toString() : v));
}

function fail(message: string, where: string, code: number): never {
  process.stderr.write(jsonText({ error: { message, where } }) + '\n');
  process.exit(code);
}

async function main(argv: string[]): Promise<void> {
  const [name, ...rest] = argv;
  if (name === undefined || name === 'help' || name === '--help') {
    process.stdout.write(jsonText({ verbs: VERBS.map((v) => v.usage) }) + '\n');
    return;
  }
  const verb = VERBS.find((v) => v.name === name);
  if (!verb) fail(`unknown verb "${name}"; known verbs: ${VERBS.map((v) => v.name).join(', ')}`, 'verb', 2);
  try {
    const args = argsParse(rest, new Set(verb.switches ?? []));
    const out = await verb.run(args);
    process.stdout.write(jsonText(out) + '\n');
  } catch (e) {
    if (e instanceof NinefoldError) fail(e.message, e.where, 2);
    throw e;
  }
}

main(process.argv.slice(2)).catch((e: unknown) => {
  fail(`internal error: ${e instanceof Error ? e.message : String(e)}`, 'internal', 1);
});
