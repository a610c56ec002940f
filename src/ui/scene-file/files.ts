// Files in and out of the page: a download of text or bytes, and reading a user's file with the size
// limit applied before a single byte is read.
import { InvalidInput } from '../../exact/errors.ts';
import { SCENE_LIMITS } from '../../scene/schema.ts';

export function fileDownload(name: string, data: string | Blob, type = 'application/json'): void {
  const blob = typeof data === 'string' ? new Blob([data], { type }) : data;
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.rel = 'noopener';
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export async function sceneFileText(file: File): Promise<string> {
  if (file.size > SCENE_LIMITS.bytes) {
    const mb = (n: number) => (n / 1048576).toFixed(1);
    throw new InvalidInput(`the file is ${mb(file.size)} MB; a scene file is at most ${mb(SCENE_LIMITS.bytes)} MB`, file.name);
  }
  return await file.text();
}
