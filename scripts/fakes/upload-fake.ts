import http from "node:http";
import { createHmac, createHash, timingSafeEqual } from "node:crypto";
import { mkdirSync, existsSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { servedHeaders } from "./upload-served";

// A loopback stand-in for the hosted upload service, speaking the protocol the
// uploadthing SDK uses: signed PUTs of multipart files, route metadata, the
// signed callback to the app, the app's callback result and UTApi's
// deleteFiles. Files are kept on disk so an upload survives a restart.
//
// Every file is served inert: the content type comes from its bytes (one of
// the three photo types, else an octet-stream download), with nosniff and a
// sandboxing CSP, so even a file the app has not yet refused cannot run.
export interface UploadFake {
  port: number;
  origin: string;
  close: () => Promise<void>;
}

interface Pending {
  metadata: unknown;
  callbackUrl: string;
  callbackSlug: string;
  awaitServerData: boolean;
}

export function uploadToken(apiKey: string, appId: string): string {
  return Buffer.from(JSON.stringify({ apiKey, appId, regions: ["loopback"] })).toString("base64");
}

function hmac(secret: string, payload: string): string {
  return "hmac-sha256=" + createHmac("sha256", secret).update(payload).digest("hex");
}

function safeEqual(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

async function readBody(req: http.IncomingMessage): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of req) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

const CORS = {
  "access-control-allow-origin": "*",
  "access-control-allow-methods": "GET, PUT, HEAD, OPTIONS, POST",
  "access-control-allow-headers": "*",
  "access-control-expose-headers": "x-ut-range-start",
};

/** fileOrigin: where files are said to be served (UPLOAD_ORIGIN); a host name that reaches this port. */
export async function startUploadFake(opts: { dir: string; port: number; apiKey: string; fileOrigin?: string }): Promise<UploadFake> {
  mkdirSync(opts.dir, { recursive: true });
  const origin = `http://127.0.0.1:${opts.port}`;
  const fileOrigin = opts.fileOrigin ? new URL(opts.fileOrigin).origin : origin;
  const pending = new Map<string, Pending>();
  const waiting = new Map<string, (serverData: unknown) => void>();

  const server = http.createServer(async (req, res) => {
    const url = new URL(req.url ?? "/", origin);
    const send = (status: number, body: unknown, headers: Record<string, string> = {}) => {
      res.writeHead(status, { "content-type": "application/json", ...CORS, ...headers });
      res.end(JSON.stringify(body));
    };
    try {
      if (req.method === "OPTIONS") return send(204, {});
      if (req.method === "POST" && url.pathname === "/route-metadata") {
        if (req.headers["x-uploadthing-api-key"] !== opts.apiKey) return send(401, { error: "bad api key" });
        const body = JSON.parse((await readBody(req)).toString("utf8"));
        for (const key of body.fileKeys as string[]) {
          pending.set(key, {
            metadata: body.metadata,
            callbackUrl: body.callbackUrl,
            callbackSlug: body.callbackSlug,
            awaitServerData: body.awaitServerData !== false,
          });
        }
        return send(200, { ok: true });
      }
      if (req.method === "POST" && url.pathname === "/callback-result") {
        const body = JSON.parse((await readBody(req)).toString("utf8"));
        waiting.get(body.fileKey)?.(body.callbackData ?? null);
        waiting.delete(body.fileKey);
        return send(200, { ok: true });
      }
      if (req.method === "POST" && url.pathname === "/v6/deleteFiles") {
        if (req.headers["x-uploadthing-api-key"] !== opts.apiKey) return send(401, { error: "bad api key" });
        const body = JSON.parse((await readBody(req)).toString("utf8"));
        let deletedCount = 0;
        for (const key of (body.fileKeys ?? []) as string[]) {
          if (!/^[\w-]+$/.test(key) || !existsSync(path.join(opts.dir, key))) continue;
          rmSync(path.join(opts.dir, key), { force: true });
          rmSync(path.join(opts.dir, key + ".json"), { force: true });
          deletedCount += 1;
        }
        return send(200, { success: true, deletedCount });
      }
      const served = url.pathname.match(/^\/f\/([\w-]+)$/);
      if ((req.method === "GET" || req.method === "HEAD") && served) {
        const file = path.join(opts.dir, served[1]);
        if (!existsSync(file)) return send(404, { error: "not found" });
        const meta = JSON.parse(readFileSync(file + ".json", "utf8"));
        const bytes = readFileSync(file);
        res.writeHead(200, { ...(await servedHeaders(bytes, String(meta.name ?? ""))), "content-length": String(bytes.length), ...CORS });
        return res.end(req.method === "HEAD" ? undefined : bytes);
      }
      const keyMatch = url.pathname.match(/^\/([\w-]+)$/);
      if (req.method === "HEAD" && keyMatch) {
        res.writeHead(200, { ...CORS, "x-ut-range-start": "0" });
        return res.end();
      }
      if (req.method === "PUT" && keyMatch) return await handlePut(keyMatch[1], url, req, send);
      send(404, { error: "not found" });
    } catch (error) {
      send(500, { error: (error as Error).message });
    }
  });

  async function handlePut(
    key: string,
    url: URL,
    req: http.IncomingMessage,
    send: (status: number, body: unknown) => void,
  ) {
    const href = origin + (req.url ?? "");
    const cut = href.indexOf("&signature=");
    const given = decodeURIComponent(url.searchParams.get("signature") ?? "");
    if (cut < 0 || !safeEqual(hmac(opts.apiKey, href.slice(0, cut)), given)) {
      return send(403, { error: "invalid signature" });
    }
    if (Number(url.searchParams.get("expires")) < Date.now()) return send(403, { error: "url expired" });
    const form = await new Request(href, {
      method: "PUT",
      headers: { "content-type": req.headers["content-type"] ?? "" },
      body: new Uint8Array(await readBody(req)),
    }).formData();
    const file = form.get("file");
    if (!(file instanceof Blob)) return send(400, { error: "multipart field 'file' missing" });
    const bytes = Buffer.from(await file.arrayBuffer());
    const fileHash = createHash("md5").update(bytes).digest("hex");
    const param = (name: string) => decodeURIComponent(url.searchParams.get(name) ?? "");
    const info = {
      name: param("x-ut-file-name") || key,
      size: bytes.length,
      type: param("x-ut-file-type") || file.type || "application/octet-stream",
      customId: null,
      lastModified: Date.now(),
      key,
      url: `${fileOrigin}/f/${key}`,
      appUrl: `${fileOrigin}/f/${key}`,
      ufsUrl: `${fileOrigin}/f/${key}`,
      fileHash,
    };
    writeFileSync(path.join(opts.dir, key), bytes);
    writeFileSync(path.join(opts.dir, key + ".json"), JSON.stringify(info));

    let serverData: unknown = null;
    const route = pending.get(key);
    if (route) {
      pending.delete(key);
      const payload = JSON.stringify({ status: "uploaded", file: info, origin, metadata: route.metadata });
      const result = route.awaitServerData
        ? new Promise<unknown>((resolve) => {
            waiting.set(key, resolve);
            setTimeout(() => resolve(null), 15_000);
          })
        : Promise.resolve(null);
      const sep = route.callbackUrl.includes("?") ? "&" : "?";
      const hook = await fetch(`${route.callbackUrl}${sep}slug=${encodeURIComponent(route.callbackSlug)}`, {
        method: "POST",
        headers: {
          "content-type": "application/json",
          "uploadthing-hook": "callback",
          "x-uploadthing-signature": hmac(opts.apiKey, payload),
        },
        body: payload,
      });
      if (!hook.ok) return send(502, { error: `the app refused the upload callback (${hook.status})` });
      serverData = await result;
    }
    send(200, { url: info.url, appUrl: info.appUrl, ufsUrl: info.ufsUrl, fileHash, serverData });
  }

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, "127.0.0.1", () => resolve());
  });
  return { port: opts.port, origin, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
