// One app instance for tests/integration/instances.test.ts: a separate Node process with its own
// database pool, limiters and photo store, serving two of the app's route handlers over HTTP on
// loopback the way scripts/server.ts does (the socket address in PEER_HEADER), plus POST /__drain,
// which runs this instance's e-mail outbox sender once (lib/mail/outbox.ts). Prints its port.
// Run with `tsx tests/helpers/instance-server.ts`; DATABASE_URL and S3_* come from the environment.
import { createServer } from "node:http";
import { Readable } from "node:stream";
import { POST as submit } from "@/app/api/requests/route";
import { GET as photo } from "@/app/api/uploads/[id]/route";
import { PEER_HEADER, trustPeerHeader } from "@/lib/api/client-address";
import { drainOutbox } from "@/lib/mail";

trustPeerHeader();

const server = createServer(async (req, res) => {
  try {
    const headers = new Headers();
    for (const [name, value] of Object.entries(req.headers)) {
      if (typeof value === "string") headers.set(name, value);
    }
    headers.set(PEER_HEADER, req.socket.remoteAddress ?? "");
    const url = `http://localhost${req.url ?? "/"}`;
    const hasBody = req.method !== "GET" && req.method !== "HEAD";
    const request = new Request(url, {
      method: req.method,
      headers,
      ...(hasBody ? { body: Readable.toWeb(req) as ReadableStream, duplex: "half" } : {}),
    } as RequestInit);
    const path = new URL(url).pathname;
    const uploadId = /^\/api\/uploads\/([^/]+)$/.exec(path)?.[1];
    const response =
      req.method === "POST" && path === "/api/requests"
        ? await submit(request, undefined as never)
        : req.method === "GET" && uploadId
          ? await photo(request, { params: Promise.resolve({ id: uploadId }) })
          : req.method === "POST" && path === "/__drain"
            ? Response.json(await drainOutbox())
            : new Response("not served here", { status: 404 });
    res.writeHead(response.status, Object.fromEntries(response.headers));
    res.end(Buffer.from(await response.arrayBuffer()));
  } catch (error) {
    res.writeHead(500).end(String(error));
  }
});

server.listen(0, "127.0.0.1", () => {
  const address = server.address();
  if (address && typeof address === "object") console.log(`PORT ${address.port}`);
});
process.on("SIGTERM", () => server.close(() => process.exit(0)));
