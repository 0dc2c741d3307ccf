import { everyone, expects, row } from "./row";
import type { AuthzRow } from "./types";

export const rows: AuthzRow[] = [
  row("GET", "health", "/api/health", everyone(200)),
  row("GET", "me", "/api/me", expects(401, 200, 200, 200, 200)),
  row("PUT", "me/drive", "/api/me/drive", expects(401, 404, 404, 404, 200), {
    body: (f) => ({ driveId: f.otherDriveId }),
    note: "any member may remember a drive, only one of the group they act in: the other group's drive is 404 for the demo group and stored for its own organiser",
  }),
  row("GET", "drives", "/api/drives", expects(401, 200, 200, 200, 200)),
  row("GET", "public/drives", "/api/public/drives", everyone(200)),
  row("GET", "auth/[...nextauth]", "/api/auth/csrf", everyone(200), { note: "next-auth's own endpoints; the session itself is what they hand out" }),
  row("POST", "auth/[...nextauth]", "/api/auth/signout", everyone([200, 302, 400]), {
    body: () => "",
    note: "without a CSRF token next-auth refuses to sign out; it never exposes data",
  }),
  row("GET", "uploadthing", "/api/uploadthing", everyone(200), { note: "the upload route's config (file types and sizes), public by design" }),
  row("POST", "uploadthing", `/api/uploadthing?actionType=upload&slug=dropPointPhoto`, expects([400, 403], [400, 403], [400, 403], 200, [400, 403, 404]), {
    body: (f) => ({ files: [{ name: "a.png", size: 10, type: "image/png", lastModified: 0 }], input: { dropPointId: f.demoDropPointId } }),
    note: "only organisers of the drop point's group may start an upload",
  }),
];
