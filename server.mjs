// The app's HTTP server: Next.js's request handler behind a plain node:http
// server, so the client's address is taken from the socket (route handlers
// never see it) and a client-set header cannot pose as it.
//   node server.mjs [--dev] -H 127.0.0.1 -p 3000
import { createServer } from "node:http";
import next from "next";
import { resolveClientAddress } from "./scripts/lib/client-chain.mjs";

const args = process.argv.slice(2);
const flag = (name, fallback) => {
  const i = args.indexOf(name);
  return i >= 0 && args[i + 1] ? args[i + 1] : fallback;
};
const dev = args.includes("--dev");
const hostname = flag("-H", process.env.HOSTNAME || "127.0.0.1");
const port = Number(flag("-p", process.env.PORT || "3000"));
const trustedHops = Number(process.env.TRUSTED_PROXY_HOPS || "0");
const CLIENT_HEADER = "x-cantrove-client";

const app = next({ dev, hostname, port, dir: import.meta.dirname });
const handle = app.getRequestHandler();
await app.prepare();

const server = createServer((req, res) => {
  req.headers[CLIENT_HEADER] = resolveClientAddress(req.socket.remoteAddress, req.headers["x-forwarded-for"], trustedHops);
  handle(req, res);
});
// The same keep-alive as `next start`, so a load balancer's pooled connections are not cut first.
server.keepAliveTimeout = 65_000;
server.listen(port, hostname, () => console.log(`Cantrove listening on http://${hostname}:${port}`));

const stop = () => server.close(() => process.exit(0));
process.once("SIGTERM", stop);
process.once("SIGINT", stop);
