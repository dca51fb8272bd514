// A small server for the crash test (tests/integration/crash.test.ts): the real POST /api/requests
// route handler on the real data folder (DATA_DIR), served with node:http on a loopback port, so
// it can be SIGKILLed mid-load without a `next build`. `--seed` loads the demo catalog first. Prints
// "listening <port>" when ready; SIGTERM closes the database and exits.
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";
import { closeDatabase, getDatabase } from "@/db/client";
import { PEER_HEADER, trustPeerHeader } from "@/lib/api/client-address";

async function main() {
  await getDatabase();
  if (process.argv.includes("--seed")) await (await import("@/db/seed-demo")).seedDemo();
  const { POST } = await import("@/app/api/requests/route");
  // Each test client says its address in the peer header, as scripts/server.ts writes it from the socket.
  trustPeerHeader();
  const server = createServer(async (req, res) => {
    const chunks: Buffer[] = [];
    for await (const chunk of req) chunks.push(chunk as Buffer);
    const headers = new Headers();
    for (const [name, value] of Object.entries(req.headers)) if (typeof value === "string") headers.set(name, value);
    headers.set(
      PEER_HEADER,
      req.socket.remoteAddress === "127.0.0.1" ? (req.headers["x-test-client"] as string) : "0.0.0.0",
    );
    const response = await POST(
      new Request(`http://127.0.0.1${req.url}`, { method: req.method, headers, body: Buffer.concat(chunks) }),
      undefined as never,
    );
    res.writeHead(response.status, { "content-type": response.headers.get("content-type") ?? "application/json" });
    res.end(Buffer.from(await response.arrayBuffer()));
  });
  server.listen(0, "127.0.0.1", () => console.log(`listening ${(server.address() as AddressInfo).port}`));
  process.on("SIGTERM", () => {
    server.close();
    void closeDatabase().then(() => process.exit(0));
  });
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
