// An example call of one operation with curl, as a script with an API token would make it.
import type { ApiOperation } from './types';

/** Quoted for a POSIX shell: inside single quotes, each ' closes, escapes and reopens. */
function shellQuoted(text: string): string {
  return `'${text.replace(/'/g, `'\\''`)}'`;
}

export function exampleUrl(operation: ApiOperation, baseUrl: string): string {
  const path = operation.path.replace(/\{([^}]+)\}/g, (_, name: string) => operation.pathExample?.[name] ?? `<${name}>`);
  const query = operation.query?.example ? `?${new URLSearchParams(operation.query.example).toString().replace(/%2C/g, ',')}` : '';
  return `${baseUrl}${path}${query}`;
}

export function curlExample(operation: ApiOperation, baseUrl: string): string {
  const lines = [`curl${operation.method === 'GET' ? '' : ` -X ${operation.method}`} ${shellQuoted(exampleUrl(operation, baseUrl))}`];
  if (operation.access !== 'public') {
    lines.push(operation.sessionOnly ? `-b "antinode_session=$ANTINODE_SESSION"` : `-H "Authorization: Bearer $ANTINODE_TOKEN"`);
  }
  const body = operation.body;
  if (body.kind === 'json') {
    lines.push(`-H 'Content-Type: application/json'`, `-d ${shellQuoted(JSON.stringify(body.example, null, 2))}`);
  } else if (body.kind === 'form') {
    lines.push(`-F ${shellQuoted(`${body.field}=@drawing.pdf`)}`);
  } else if (body.kind === 'text') {
    lines.push(`-H "${body.header.name}: $SIGNATURE"`, `-H 'Content-Type: application/json'`, `--data-binary @event.json`);
  }
  return lines.join(' \\\n  ');
}
