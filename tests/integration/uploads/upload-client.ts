import type { ApiClient } from "@/tests/support/http";

// What the browser's upload helper does, over HTTP: ask the app for a signed
// URL (uploadthing's own protocol), PUT the bytes to the upload service, and
// read back the app's answer that the service relays (serverData).
export interface UploadOutcome {
  presignStatus: number;
  presignBody: string;
  key?: string;
  ufsUrl?: string;
  serverData?: { url?: string; refused?: string } | null;
}

export async function uploadThroughApp(
  client: ApiClient,
  slug: "dropPointPhoto" | "fillReportPhoto",
  input: Record<string, string>,
  file: { name: string; type: string; bytes: Uint8Array },
): Promise<UploadOutcome> {
  const res = await client.request(
    "POST",
    `/api/uploadthing?actionType=upload&slug=${slug}`,
    { files: [{ name: file.name, size: file.bytes.length, type: file.type, lastModified: Date.now() }], input },
    { "x-uploadthing-package": "@uploadthing/react", "x-uploadthing-version": "7.7.4" },
  );
  const presignBody = await res.text();
  if (!res.ok) return { presignStatus: res.status, presignBody };
  const [signed] = JSON.parse(presignBody) as { url: string; key: string }[];
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(file.bytes)], { type: file.type }), file.name);
  const put = await fetch(signed.url, { method: "PUT", body: form, signal: AbortSignal.timeout(25_000) });
  if (!put.ok) throw new Error(`the upload service refused the PUT: ${put.status} ${await put.text()}`);
  const body = (await put.json()) as { ufsUrl: string; serverData: UploadOutcome["serverData"] };
  return { presignStatus: res.status, presignBody, key: signed.key, ufsUrl: body.ufsUrl, serverData: body.serverData };
}
