// Serves the built app (used by `npm start` and the browser tests). The same as `next start`, plus one
// rule about forwarded headers: unless COILWRIGHT_TRUST_PROXY=1 says a reverse proxy stands in front,
// X-Forwarded-For is set to the TCP peer and X-Forwarded-Host/-Proto sent by clients are dropped, so a
// client cannot choose its address for the sign-in limit or its host for the server actions' origin check.
// Behind a proxy the proxy's headers are believed (it must overwrite or append them).
import { createServer } from 'node:http';
import next from 'next';

const port = Number(process.env.PORT ?? 3000);
const hostname = process.env.HOST ?? '127.0.0.1';
const trustProxy = process.env.COILWRIGHT_TRUST_PROXY === '1';

const app = next({ dev: false, hostname, port });
const handle = app.getRequestHandler();
await app.prepare();

const server = createServer((req, res) => {
  if (!trustProxy) {
    req.headers['x-forwarded-for'] = req.socket.remoteAddress ?? 'unknown';
    delete req.headers['x-forwarded-host'];
    delete req.headers['x-forwarded-proto'];
    delete req.headers['x-forwarded-port'];
  }
  handle(req, res).catch((err) => {
    console.error('[coilwright] request failed', err);
    if (!res.headersSent) res.statusCode = 500;
    res.end();
  });
});
server.listen(port, hostname, () => console.log(`Coilwright ready on http://${hostname}:${port}`));

const stop = () => server.close(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
