import { createServer, type IncomingMessage, type Server } from "node:http";
import type { AddressInfo } from "node:net";

export type Recorded = { method: string; path: string; query: URLSearchParams; body: unknown; auth: string | undefined };
type SearchReply = (body: { queries: { filter?: string }[] }) => unknown;

const readBody = (req: IncomingMessage) =>
  new Promise<unknown>((resolve) => {
    let data = "";
    req.on("data", (c: Buffer) => (data += c.toString("utf8")));
    req.on("end", () => resolve(data ? JSON.parse(data) : undefined));
  });

/**
 * A loopback stand-in for the Meilisearch HTTP API: it records every request and answers the
 * few endpoints the engine uses. Each task reports "processing" once, then its final status.
 */
export async function startMeiliStub() {
  const requests: Recorded[] = [];
  const polls = new Map<number, number>();
  const taskStatus = new Map<number, { status: string; type: string; error: unknown }>();
  let nextTask = 1;
  let failNext: string | null = null;
  let searchReply: SearchReply = () => ({ results: [] });

  const task = (type: string, indexUid: string) => {
    const uid = nextTask++;
    const failing = failNext;
    failNext = null;
    taskStatus.set(uid, { status: failing ? "failed" : "succeeded", type, error: failing ? { message: failing, code: failing } : null });
    return { taskUid: uid, indexUid, status: "enqueued", type, enqueuedAt: "2026-12-01T00:00:00Z" };
  };

  const server: Server = createServer(async (req, res) => {
    const url = new URL(req.url ?? "/", "http://stub");
    const body = await readBody(req);
    requests.push({ method: req.method ?? "", path: url.pathname, query: url.searchParams, body, auth: req.headers.authorization });
    const send = (status: number, json: unknown) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(json));
    };
    const idx = url.pathname.match(/^\/indexes\/([^/]+)\/(settings|documents|documents\/delete)$/);
    const taskGet = url.pathname.match(/^\/tasks\/(\d+)$/);
    if (req.method === "POST" && url.pathname === "/indexes") return send(202, task("indexCreation", (body as { uid: string }).uid));
    if (idx && req.method === "PATCH" && idx[2] === "settings") return send(202, task("settingsUpdate", idx[1]));
    if (idx && req.method === "POST" && idx[2] === "documents") return send(202, task("documentAdditionOrUpdate", idx[1]));
    if (idx && req.method === "POST" && idx[2] === "documents/delete") return send(202, task("documentDeletion", idx[1]));
    if (taskGet && req.method === "GET") {
      const uid = Number(taskGet[1]);
      const seen = (polls.get(uid) ?? 0) + 1;
      polls.set(uid, seen);
      const final = taskStatus.get(uid);
      if (!final) return send(404, { message: "no task", code: "task_not_found" });
      return send(200, {
        uid,
        indexUid: "swarfbook_search",
        type: final.type,
        status: seen === 1 ? "processing" : final.status,
        error: seen === 1 ? null : final.error,
      });
    }
    if (req.method === "POST" && url.pathname === "/multi-search")
      return send(200, searchReply(body as { queries: { filter?: string }[] }));
    send(404, { message: "not stubbed", code: "not_stubbed" });
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;
  return {
    host: `http://127.0.0.1:${port}`,
    requests,
    polls,
    failNextTask: (code: string) => (failNext = code),
    onSearch: (reply: SearchReply) => (searchReply = reply),
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
