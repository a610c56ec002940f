// GMP's mpz_gcd (the gmp-wasm package's WebAssembly build of GMP, LGPL-3.0) as an optional gcd kernel,
// present only where it can be set up synchronously: in Node (the CLI, the tests, the benchmarks) the
// module's bytes are read and inflated with Node's own fs and zlib, compiled with `new WebAssembly.Module`
// and instantiated with `new WebAssembly.Instance`, all synchronous. Elsewhere (the browser page and its
// worker, where no synchronous inflater is at hand) `gcdGmpKernel()` is null and src/exact/gcd.ts keeps
// its BigInt Lehmer kernel. The package's own API is asynchronous, so this file reaches for the module
// bytes it ships (gmpmini.wasm.ts, deflated base64) and the C entry points the module exports (z_gcd,
// z_set_str, z_get_str, ...): a version that changed either fails the self-check below and is not used.
//
// Canonical form: the kernel returns gcd(|a|, |b|) >= 0, like gcd.ts. Numbers cross into the module as
// hexadecimal text (BigInt's toString(16) and mpz_set_str in base 16 are both linear), which measured
// cheaper than copying 64-bit limbs through typed arrays from JavaScript.

interface GmpExports {
  memory: WebAssembly.Memory;
  _initialize(): void;
  g_malloc(bytes: number): number;
  g_free(ptr: number): void;
  z_t(): number;
  z_init(z: number): void;
  z_set_str(z: number, str: number, base: number): number;
  z_get_str(out: number, base: number, z: number): number;
  z_sizeinbase(z: number, base: number): number;
  z_gcd(r: number, a: number, b: number): void;
}

type NodeLike = { getBuiltinModule?: (name: string) => unknown };
// The few members of Node's fs, zlib and module used here, typed locally: the core imports no built-in.
type NodeFs = { readFileSync(path: string, encoding: 'utf8'): string };
type NodeZlib = { inflateRawSync(data: Uint8Array): Uint8Array };
type NodeModule = { createRequire(from: string): { resolve(id: string): string } };
type NodeBuffer = { from(text: string, encoding: 'base64'): Uint8Array };

let tried = false;
let kernel: ((a: bigint, b: bigint) => bigint) | null = null;

/** The GMP gcd where it loads synchronously (Node), else null. Loaded once, on first use. */
export function gcdGmpKernel(): ((a: bigint, b: bigint) => bigint) | null {
  if (tried) return kernel;
  tried = true;
  try {
    const x = gmpInstantiate();
    if (x) {
      const k = gmpGcdMake(x);
      // Self-check on numbers past one limb and with a known answer before trusting the entry points.
      const g = (1n << 127n) - 1n;
      if (k(g * 1000003n, -g * 999983n) === g && k(0n, 5n) === 5n) kernel = k;
    }
  } catch {
    kernel = null;
  }
  return kernel;
}

function gmpInstantiate(): GmpExports | null {
  const proc = (globalThis as { process?: NodeLike }).process;
  if (typeof WebAssembly === 'undefined' || !proc || typeof proc.getBuiltinModule !== 'function') return null;
  const fs = proc.getBuiltinModule('fs') as NodeFs;
  const zlib = proc.getBuiltinModule('zlib') as NodeZlib;
  const mod = proc.getBuiltinModule('module') as NodeModule;
  const buffer = (proc.getBuiltinModule('buffer') as { Buffer: NodeBuffer }).Buffer;
  const path = mod.createRequire(import.meta.url).resolve('gmp-wasm/package.json').replace(/package\.json$/, 'gmpmini.wasm.ts');
  const text = fs.readFileSync(path, 'utf8');
  const b64 = /gmpWasm\s*=\s*'([^']+)'/.exec(text)?.[1];
  if (!b64) return null;
  const bytes = zlib.inflateRawSync(buffer.from(b64, 'base64'));
  const fatal = () => {
    throw new Error('gmp-wasm: fatal error inside the module');
  };
  const instance = new WebAssembly.Instance(new WebAssembly.Module(bytes as BufferSource), {
    env: { emscripten_notify_memory_growth: () => {} },
    wasi_snapshot_preview1: { proc_exit: fatal, fd_write: fatal, fd_seek: fatal, fd_close: fatal },
  });
  const x = instance.exports as unknown as GmpExports;
  x._initialize();
  return x;
}

function gmpGcdMake(x: GmpExports): (a: bigint, b: bigint) => bigint {
  const za = x.z_t();
  const zb = x.z_t();
  const zg = x.z_t();
  x.z_init(za);
  x.z_init(zb);
  x.z_init(zg);
  const enc = new TextEncoder();
  const dec = new TextDecoder();
  let buf = 0;
  let bufLen = 0;
  // The memory may grow inside any call, so a view is taken afresh after each.
  const room = (n: number) => {
    if (n <= bufLen) return;
    if (buf) x.g_free(buf);
    bufLen = Math.max(2 * n, 4096);
    buf = x.g_malloc(bufLen);
    if (!buf) throw new Error('gmp-wasm: out of memory');
  };
  const put = (z: number, v: bigint) => {
    const hex = (v < 0n ? -v : v).toString(16);
    room(hex.length + 1);
    const u8 = new Uint8Array(x.memory.buffer, buf, hex.length + 1);
    enc.encodeInto(hex, u8);
    u8[hex.length] = 0;
    if (x.z_set_str(z, buf, 16) !== 0) throw new Error('gmp-wasm: mpz_set_str refused a hexadecimal string');
  };
  const get = (z: number): bigint => {
    room(x.z_sizeinbase(z, 16) + 2);
    x.z_get_str(buf, 16, z);
    const u8 = new Uint8Array(x.memory.buffer, buf, bufLen);
    const end = u8.indexOf(0);
    return BigInt('0x' + dec.decode(u8.subarray(0, end)));
  };
  return (a, b) => {
    put(za, a);
    put(zb, b);
    x.z_gcd(zg, za, zb);
    return get(zg);
  };
}
