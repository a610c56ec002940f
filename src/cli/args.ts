// Argument splitting for the CLI: positionals, `--flag value`, `--flag=value`, and bare `--switch`.
// A token like "-3,4" or "-x^2 + y" is a positional (a point or an equation), not a flag: only a
// leading "--" starts an option.
import { InvalidInput } from '../exact/errors.ts';

export interface Args {
  readonly positional: string[];
  readonly options: Map<string, string | true>;
}

export function argsParse(argv: readonly string[], switches: ReadonlySet<string> = new Set()): Args {
  const positional: string[] = [];
  const options = new Map<string, string | true>();
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--') {
      positional.push(...argv.slice(i + 1));
      break;
    }
    if (a.startsWith('--') && a.length > 2) {
      const eq = a.indexOf('=');
      if (eq > 0) {
        options.set(a.slice(2, eq), a.slice(eq + 1));
      } else {
        const name = a.slice(2);
        if (switches.has(name)) options.set(name, true);
        else if (i + 1 < argv.length) options.set(name, argv[++i]);
        else throw new InvalidInput(`option --${name} needs a value`, `--${name}`);
      }
    } else {
      positional.push(a);
    }
  }
  return { positional, options };
}

export function optionString(args: Args, name: string): string | undefined {
  const v = args.options.get(name);
  if (v === true) throw new InvalidInput(`option --${name} needs a value`, `--${name}`);
  return v;
}

export function optionInteger(args: Args, name: string, fallback: number, min = 0, max = Number.MAX_SAFE_INTEGER): number {
  const v = optionString(args, name);
  if (v === undefined) return fallback;
  if (!/^[+-]?\d+$/.test(v.trim())) throw new InvalidInput(`--${name} must be an integer, found "${v}"`, `--${name}`);
  const n = Number(v);
  if (n < min || n > max) throw new InvalidInput(`--${name} must be between ${min} and ${max}, found ${n}`, `--${name}`);
  return n;
}

export function positionalAt(args: Args, index: number, what: string): string {
  const v = args.positional[index];
  if (v === undefined) throw new InvalidInput(`missing ${what} (argument ${index + 1})`, `argument ${index + 1}`);
  return v;
}
