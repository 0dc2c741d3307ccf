import type { AuthzRow } from "./types";

export const rows: AuthzRow[] = [
  {
    route: "app/api/health/route.ts",
    method: "GET",
    path: () => "/api/health",
    expect: { anonymous: 200, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 },
  },
  {
    route: "app/api/me/route.ts",
    method: "GET",
    path: () => "/api/me",
    expect: { anonymous: 401, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 },
  },
  {
    route: "app/api/me/drive/route.ts",
    method: "PUT",
    path: () => "/api/me/drive",
    body: (f) => ({ driveId: f.otherDriveId }),
    expect: { anonymous: 401, volunteer: 404, builder: 404, organiser: 404, otherOrganiser: 200 },
    note: "any member may remember a drive, only one of the group they act in: the other group's drive is 404 for the demo group and stored for its own organiser",
  },
  {
    route: "app/api/drives/route.ts",
    method: "GET",
    path: () => "/api/drives",
    expect: { anonymous: 401, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 },
  },
  {
    route: "app/api/public/drives/route.ts",
    method: "GET",
    path: () => "/api/public/drives",
    expect: { anonymous: 200, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 },
  },
  {
    route: "app/api/auth/[...nextauth]/route.ts",
    method: "GET",
    path: () => "/api/auth/csrf",
    expect: { anonymous: 200, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 },
    note: "next-auth's own endpoints; the session itself is what they hand out",
  },
  {
    route: "app/api/auth/[...nextauth]/route.ts",
    method: "POST",
    path: () => "/api/auth/signout",
    body: () => "",
    expect: { anonymous: [200, 302, 400], volunteer: [200, 302, 400], builder: [200, 302, 400], organiser: [200, 302, 400], otherOrganiser: [200, 302, 400] },
    note: "without a CSRF token next-auth refuses to sign out; it never exposes data",
  },
  {
    route: "app/api/uploadthing/route.ts",
    method: "GET",
    path: () => "/api/uploadthing",
    expect: { anonymous: 200, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 },
    note: "the upload route's config (file types and sizes), public by design",
  },
  {
    route: "app/api/uploadthing/route.ts",
    method: "POST",
    path: () => `/api/uploadthing?actionType=upload&slug=dropPointPhoto`,
    body: (f) => ({ files: [{ name: "a.png", size: 10, type: "image/png", lastModified: 0 }], input: { dropPointId: f.demoDropPointId } }),
    expect: { anonymous: [400, 403], volunteer: [400, 403], builder: [400, 403], organiser: 200, otherOrganiser: [400, 403, 404] },
    note: "only organisers of the drop point's group may start an upload",
  },
];
