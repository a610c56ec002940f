// `npm start` on a fresh clone: install node modules first when they are missing.
import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';

if (!existsSync('node_modules/.package-lock.json') || !existsSync('node_modules/vite')) {
  console.error('node_modules missing: running npm ci');
  const r = spawnSync('npm', ['ci'], { stdio: 'inherit' });
  if (r.status !== 0) process.exit(r.status ?? 1);
}
