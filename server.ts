/**
 * The production server: Next's own request handler behind a plain Node HTTP server, so that the app knows who opened
 * each connection. `next start` hands route handlers only the X-Forwarded-For header, which any client can write;
 * here the socket's address is put in a header of our own, overwriting whatever a client sent under that name, and
 * lib/http/client-address.ts believes X-Forwarded-For only when that address is one of TRUSTED_PROXIES.
 *
 * Run by `npm start` and `npm test` (docker-free-minio-fake/stack.ts): `tsx server.ts` after `next build`.
 */
import { createServer } from "node:http";

// The name lib/http/client-address.ts reads (PEER_HEADER); kept literal so that this file loads none of the app.
const PEER_HEADER = "x-understudy-peer";

// As `next start` does: the production build runs with NODE_ENV=production, set before Next is loaded.
Object.assign(process.env, { NODE_ENV: "production" });
const { default: next } = await import("next");

const port = Number(process.env.PORT ?? 3000);
const hostname = process.env.HOST ?? "127.0.0.1";
const app = next({ dev: false, hostname, port });
const handle = app.getRequestHandler();

await app.prepare();
createServer((request, response) => {
  request.headers[PEER_HEADER] = request.socket.remoteAddress ?? "";
  void handle(request, response);
}).listen(port, hostname, () => {
  console.log(`> Understudy is serving on http://${hostname}:${port}`);
});
