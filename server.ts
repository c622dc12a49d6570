// Serves Farfield: Next.js inside Node's own HTTP server, for two things Next cannot do for us. A route
// handler cannot see the connection, so this server writes the socket's address into a header of its own
// (overwriting any copy a client sent) for the sign-in limits. And Next answers a method a route does not
// have with an empty 405; this one gives it a JSON body and the API's headers like every other answer.
// npm start, npm test and deployments run `npx tsx server.ts [-H host] [-p port]` instead of `next start`.
import { createServer, type ServerResponse } from "node:http";
import { PEER_HEADER } from "./lib/http/forwarded";
import { API_CSP, setSecurityHeaders } from "./lib/http/security-headers";

function option(flag: string, fallback: string): string {
  const i = process.argv.indexOf(flag);
  return i > 0 && process.argv[i + 1] ? process.argv[i + 1]! : fallback;
}

/** Next answers a 405 with an empty (streamed) body: send the API's JSON error and headers instead. */
function jsonMethodNotAllowed(res: ServerResponse): void {
  let replacing = false;
  const writeHead = res.writeHead.bind(res) as (...args: unknown[]) => ServerResponse;
  res.writeHead = ((status: number, ...rest: unknown[]) => {
    if (status === 405) {
      replacing = true;
      const headers = new Headers({ "Content-Type": "application/json", "Cache-Control": "no-store" });
      setSecurityHeaders(headers, API_CSP);
      headers.forEach((value, name) => res.setHeader(name, value));
    }
    return writeHead(status, ...rest);
  }) as typeof res.writeHead;
  const write = res.write.bind(res) as (...args: unknown[]) => boolean;
  res.write = ((...args: unknown[]) => {
    if (!replacing) return write(...args);
    (args.find((a) => typeof a === "function") as (() => void) | undefined)?.();
    return true;
  }) as typeof res.write;
  const end = res.end.bind(res) as (...args: unknown[]) => ServerResponse;
  res.end = ((...args: unknown[]) => {
    if (!replacing && !(res.statusCode === 405 && !res.headersSent)) return end(...args);
    if (!res.headersSent) res.writeHead(405);
    return end(JSON.stringify({ error: "This API route does not accept that method." }), args.find((a) => typeof a === "function"));
  }) as typeof res.end;
}

async function main() {
  const hostname = option("-H", "127.0.0.1");
  const port = Number(option("-p", process.env.PORT ?? "3000"));
  (process.env as Record<string, string>).NODE_ENV ??= "production";
  process.env.FARFIELD_PEER_HEADER = "true"; // lib/env.ts: the header below can be believed
  const { default: next } = await import("next");
  const app = next({ dev: false, hostname, port });
  const handle = app.getRequestHandler();
  await app.prepare();
  createServer((req, res) => {
    req.headers[PEER_HEADER] = req.socket.remoteAddress ?? "";
    if (req.url?.startsWith("/api/")) jsonMethodNotAllowed(res);
    void handle(req, res);
  }).listen(port, hostname, () => console.log(`[farfield] serving on http://${hostname}:${port}`));
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
