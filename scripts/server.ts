// `npm start`: Next's production server behind a few lines that give the app the socket address.
// Next's route handlers never see the socket, and `next start` keeps a client's own
// X-Forwarded-For as it came, so the real address would be lost; here each request gets
// PEER_HEADER from the socket (replacing any client value) and the process is marked so
// lib/api/client-address.ts believes that header. Usage: `tsx scripts/server.ts [-p PORT]`.
import { createServer } from "node:http";
import next from "next";
import { PEER_HEADER, trustPeerHeader } from "@/lib/api/client-address";

function portFromArgs(): number {
  const i = process.argv.findIndex((a) => a === "-p" || a === "--port");
  const raw = i >= 0 ? process.argv[i + 1] : process.env.PORT;
  const port = Number(raw ?? 3000);
  if (!Number.isInteger(port) || port <= 0 || port > 65535) throw new Error(`PORT must be a port number, not "${raw}"`);
  return port;
}

async function main() {
  const port = portFromArgs();
  const hostname = "localhost";
  trustPeerHeader();
  const app = next({ dev: false, hostname, port });
  const handle = app.getRequestHandler();
  await app.prepare();
  const server = createServer((req, res) => {
    req.headers[PEER_HEADER] = req.socket.remoteAddress ?? "";
    void handle(req, res);
  });
  // Every interface, as `next start` does.
  server.listen(port, () => console.log(`[sagwise] listening on port ${port}`));
  const stop = () => server.close(() => process.exit(0));
  process.once("SIGTERM", stop);
  process.once("SIGINT", stop);
}

main().catch((error: unknown) => {
  console.error(`[sagwise] cannot start: ${(error as Error).message}`);
  process.exit(1);
});
