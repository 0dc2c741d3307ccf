import type { AuthzRow } from "./types";

// Drives, drop points and the public drive endpoints. Mutations send an
// invalid body, so allowed callers get 422 and nothing is written; another
// group's drive or drop point is 404 before the body is read.
const organiserOnly = { anonymous: 401, volunteer: 403, builder: 403, organiser: 422, otherOrganiser: 404 };
const anyone = { anonymous: 200, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 };

export const rows: AuthzRow[] = [
  {
    route: "app/api/drives/route.ts",
    method: "POST",
    path: () => "/api/drives",
    body: () => ({ name: "" }),
    expect: { anonymous: 401, volunteer: 403, builder: 403, organiser: 422, otherOrganiser: 422 },
    note: "each organiser creates drives in their own group",
  },
  {
    route: "app/api/drives/[id]/route.ts",
    method: "GET",
    path: (f) => `/api/drives/${f.demoDriveId}`,
    expect: { anonymous: 401, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 404 },
  },
  {
    route: "app/api/drives/[id]/route.ts",
    method: "PUT",
    path: (f) => `/api/drives/${f.demoDriveId}`,
    body: () => ({ name: "" }),
    expect: organiserOnly,
  },
  {
    route: "app/api/drives/[id]/drop-points/route.ts",
    method: "GET",
    path: (f) => `/api/drives/${f.demoDriveId}/drop-points`,
    expect: { anonymous: 401, volunteer: 403, builder: 403, organiser: 200, otherOrganiser: 404 },
    note: "holds the hosts' contact details, so organisers only",
  },
  {
    route: "app/api/drives/[id]/drop-points/route.ts",
    method: "POST",
    path: (f) => `/api/drives/${f.demoDriveId}/drop-points`,
    body: () => ({ name: "x", lat: 200, lng: 0, capacityBags: 0 }),
    expect: organiserOnly,
  },
  {
    route: "app/api/drop-points/[id]/route.ts",
    method: "PATCH",
    path: (f) => `/api/drop-points/${f.demoDropPointId}`,
    body: () => ({ lat: 95 }),
    expect: organiserOnly,
  },
  {
    route: "app/api/drop-points/[id]/fill-clear/route.ts",
    method: "POST",
    path: (f) => `/api/drop-points/${f.demoDropPointId}/fill-clear`,
    body: () => ({ asOf: "not a time" }),
    expect: organiserOnly,
  },
  {
    route: "app/api/public/drives/[slug]/route.ts",
    method: "GET",
    path: (f) => `/api/public/drives/${f.demoDriveSlug}`,
    expect: anyone,
  },
  {
    route: "app/api/public/drives/[slug]/drop-points/route.ts",
    method: "GET",
    path: (f) => `/api/public/drives/${f.demoDriveSlug}/drop-points`,
    expect: anyone,
  },
  {
    route: "app/api/public/drives/[slug]/pledges/route.ts",
    method: "POST",
    path: (f) => `/api/public/drives/${f.demoDriveSlug}/pledges`,
    body: () => ({ bags: 0 }),
    expect: { anonymous: 422, volunteer: 422, builder: 422, organiser: 422, otherOrganiser: 422 },
    note: "anyone may pledge; the invalid body writes nothing",
  },
  {
    route: "app/api/public/drives/[slug]/drop-points/[id]/fill-reports/route.ts",
    method: "POST",
    path: (f) => `/api/public/drives/${f.demoDriveSlug}/drop-points/${f.demoDropPointId}/fill-reports`,
    body: () => ({ level: 33 }),
    expect: { anonymous: 422, volunteer: 422, builder: 422, organiser: 422, otherOrganiser: 422 },
    note: "anyone at the bin may report; the invalid body writes nothing",
  },
];

rows.push({
  route: "app/api/uploadthing/route.ts",
  method: "POST",
  path: () => "/api/uploadthing?actionType=upload&slug=fillReportPhoto",
  body: () => ({ files: [{ name: "a.png", size: 10, type: "image/png", lastModified: 0 }], input: { fillReportId: "00000000-0000-4000-8000-000000000000" } }),
  expect: { anonymous: [400, 404], volunteer: [400, 404], builder: [400, 404], organiser: [400, 404], otherOrganiser: [400, 404] },
  note: "a fill report photo only attaches to a report made in the last 15 minutes; this one does not exist",
});
