/** Characters that file systems refuse or treat specially, and control characters. */
// eslint-disable-next-line no-control-regex -- control characters are what it removes
const UNSAFE = /[\\/:*?"<>|\u0000-\u001f\u007f]+/g;

/** The download name of a session: `<input-name>.returnrate-session.json`, with unsafe characters as '_'. */
export function sessionFileName(inputName: string): string {
  const safe = inputName.replace(UNSAFE, '_').replace(/^[.\s]+|\s+$/g, '').slice(0, 120);
  return `${safe === '' ? 'analysis' : safe}.returnrate-session.json`;
}
