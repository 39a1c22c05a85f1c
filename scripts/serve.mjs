// Serves the production build (next build into ANTINODE_DIST_DIR, default .next), as `next start`
// would, with one addition: every request carries the address of the connection's peer in
// x-antinode-peer, overwriting any value a client sent. lib/http/client-address.ts reads it, and
// believes X-Forwarded-For only when that peer is a trusted proxy (ANTINODE_TRUSTED_PROXIES).
//   node scripts/serve.mjs --port 3000 --host 127.0.0.1
import { createServer } from 'node:http';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

function option(name, fallback) {
  const index = process.argv.indexOf(`--${name}`);
  return index >= 0 && process.argv[index + 1] ? process.argv[index + 1] : fallback;
}

const port = Number(option('port', process.env.PORT ?? '3000'));
const hostname = option('host', process.env.HOST ?? '127.0.0.1');
const dir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
process.env.NODE_ENV = 'production';
process.env.NEXT_TELEMETRY_DISABLED ??= '1';

const { default: next } = await import('next');
const app = next({ dev: false, dir, hostname, port });
const handle = app.getRequestHandler();
await app.prepare();

const server = createServer((request, response) => {
  request.headers['x-antinode-peer'] = request.socket.remoteAddress ?? '';
  handle(request, response).catch((error) => {
    console.error('[serve] request failed', error);
    if (!response.headersSent) response.writeHead(500, { 'content-type': 'text/plain; charset=utf-8' });
    response.end('Something went wrong on the server.');
  });
});

server.listen(port, hostname, () => console.log(`> Antinode ready on http://${hostname}:${port}`));
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => {
    server.close(() => process.exit(0));
    setTimeout(() => process.exit(0), 5000).unref();
  });
}
