import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { UTApi, UTFile } from "uploadthing/server";
import { startUploadFake, uploadToken, type UploadFake } from "@/scripts/fakes/upload-fake";
import { freePort } from "@/tests/support/ports";
import { SCRIPTED_SVG, TEXT_AS_PNG, pngBytes } from "@/tests/support/images";

// The local upload service on its own (no app): how it serves what it holds,
// and UTApi's deleteFiles, which the app uses for refused files.

const apiKey = "sk_test_served";
let dir: string;
let fake: UploadFake;
let api: UTApi;

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), "uploads-"));
  const port = await freePort();
  // "localhost" reaches the same port but is another site than 127.0.0.1, as files should be.
  fake = await startUploadFake({ dir, port, apiKey, fileOrigin: `http://localhost:${port}` });
  api = new UTApi({ token: uploadToken(apiKey, "served-test"), ingestUrl: fake.origin, apiUrl: fake.origin });
});
afterAll(async () => {
  await fake.close();
  rmSync(dir, { recursive: true, force: true });
});

async function put(bytes: Uint8Array, name: string, type: string) {
  const [result] = await api.uploadFiles([new UTFile([new Uint8Array(bytes)], name, { type })]);
  expect(result.error).toBeNull();
  return result.data!;
}

describe("files are served inert", () => {
  it("serves an SVG that declared itself an image as a download, never as image/svg+xml", async () => {
    const file = await put(SCRIPTED_SVG, "drawing.svg", "image/svg+xml");
    const res = await fetch(file.ufsUrl);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/octet-stream");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="drawing.bin"');
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("content-security-policy")).toBe("default-src 'none'; img-src 'self'; sandbox");
    await res.body?.cancel();
  });

  it("serves a PNG as image/png inline with a filename that cannot break the header", async () => {
    const file = await put(pngBytes(4), 'sign"; x=\r\n.png', "image/png");
    const res = await fetch(file.ufsUrl);
    expect(res.headers.get("content-type")).toBe("image/png");
    expect(res.headers.get("content-disposition")).toBe('inline; filename="sign-x.png"');
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    await res.body?.cancel();
  });

  it("puts files under the configured file origin", async () => {
    const file = await put(TEXT_AS_PNG, "fake.png", "image/png");
    expect(new URL(file.ufsUrl).origin).toBe(`http://localhost:${fake.port}`);
    expect((await fetch(file.ufsUrl)).headers.get("content-type")).toBe("application/octet-stream");
  });
});

describe("UTApi.deleteFiles", () => {
  it("deletes a stored file for the holder of the API key, so it is no longer served", async () => {
    const file = await put(TEXT_AS_PNG, "fake.png", "image/png");
    expect((await fetch(file.ufsUrl)).status).toBe(200);
    const stranger = new UTApi({ token: uploadToken("sk_wrong", "served-test"), ingestUrl: fake.origin, apiUrl: fake.origin });
    await expect(stranger.deleteFiles(file.key)).rejects.toThrow();
    expect((await fetch(file.ufsUrl)).status).toBe(200);
    expect(await api.deleteFiles(file.key)).toEqual({ success: true, deletedCount: 1 });
    expect((await fetch(file.ufsUrl)).status).toBe(404);
    expect(await api.deleteFiles(file.key)).toEqual({ success: true, deletedCount: 0 });
  });
});
