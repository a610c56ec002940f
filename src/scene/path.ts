// Places inside a scene file written as JSON paths: ['objects', 3, 'parents', 1] -> "objects[3].parents[1]".
// These are the `where` of every refusal, so a user can find the spot in the file.
export type PathPart = string | number;

export function scenePathText(path: readonly PathPart[]): string {
  let out = '';
  for (const part of path) {
    if (typeof part === 'number') out += `[${part}]`;
    else if (/^[A-Za-z_$][A-Za-z0-9_$]*$/.test(part)) out += out === '' ? part : `.${part}`;
    else out += `[${JSON.stringify(part)}]`;
  }
  return out === '' ? '(the whole file)' : out;
}
