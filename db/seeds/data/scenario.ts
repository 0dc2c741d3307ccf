// The invented demo scenario: the Larkhollow Warm Rooms Circle on the
// (invented) island town of Larkhollow, and an unrelated group in Brindle Quay.
// Every name, place and number here is made up for the demo.
export const DEMO_PASSWORD = "cantrove-demo";

export const DEMO_TOWN = { name: "Larkhollow", lat: 47.2, lng: -8.0 };

export const DEMO_GROUP = {
  slug: "larkhollow-warm-rooms",
  name: "Larkhollow Warm Rooms Circle",
  town: "Larkhollow",
  workshop: { lat: 47.1978, lng: -8.0061 },
};

export const OTHER_GROUP = {
  slug: "brindle-quay-fixers",
  name: "Brindle Quay Fixers",
  town: "Brindle Quay",
  workshop: { lat: 47.2315, lng: -7.9521 },
};

export const DEMO_PEOPLE = [
  { email: "organiser@cantrove.test", name: "Mara Quillon", group: "demo", role: "organiser" },
  { email: "volunteer@cantrove.test", name: "Tobin Ashgrove", group: "demo", role: "volunteer" },
  { email: "builder@cantrove.test", name: "Edda Vantreel", group: "demo", role: "builder" },
  { email: "organiser@elsewhere.test", name: "Pell Rudd", group: "other", role: "organiser" },
] as const;

export const DEMO_DRIVES = [
  {
    key: "winter",
    group: "demo",
    slug: "larkhollow-winter-2026",
    name: "Larkhollow Winter Warmth Drive",
    startsOn: "2026-11-01",
    endsOn: "2027-01-31",
    isPublic: true,
    description: "Cans for four wall heaters: the library reading room, two hillside cottages and the scout hut.",
  },
  {
    key: "harvest",
    group: "demo",
    slug: "larkhollow-harvest-2026",
    name: "Larkhollow Harvest Fair Drive",
    startsOn: "2026-08-15",
    endsOn: "2026-10-15",
    isPublic: true,
    description: "Our first drive, run from the harvest fair stalls.",
  },
  {
    key: "quay",
    group: "other",
    slug: "brindle-quay-boatshed",
    name: "Brindle Quay Boatshed Drive",
    startsOn: "2026-10-01",
    endsOn: "2026-12-20",
    isPublic: true,
    description: "Cans for one heater on the boatshed workshop wall.",
  },
] as const;

export const DEMO_DROP_POINTS = [
  { drive: "winter", name: "Larkhollow Library porch", address: "2 Reed Lane", lat: 47.2012, lng: -8.0018, hours: "Mon–Sat 9:00–17:00", capacity: 6, host: "Ina Marsh", phone: "+00 555 0101" },
  { drive: "winter", name: "Hilltop Corner Shop", address: "41 Ridge Road", lat: 47.2049, lng: -7.9921, hours: "Daily 7:00–21:00", capacity: 4, host: "Odo Brand", phone: "+00 555 0102" },
  { drive: "winter", name: "Millbrook School gate", address: "Millbrook Way", lat: 47.1951, lng: -8.0104, hours: "School days 8:00–16:00", capacity: 8, host: "Sal Fenwick", phone: "+00 555 0103" },
  { drive: "winter", name: "Quayside Community Hall", address: "9 Harbour Row", lat: 47.1932, lng: -7.9968, hours: "Tue–Sun 10:00–20:00", capacity: 6, host: "Rufus Tey", phone: "+00 555 0104" },
  { drive: "winter", name: "Greenfold Allotments shed", address: "Greenfold Path", lat: 47.2071, lng: -8.0089, hours: "Sat–Sun 9:00–13:00", capacity: 3, host: "Wen Callow", phone: "+00 555 0105" },
  { drive: "harvest", name: "Harvest Fair stall", address: "Market Green", lat: 47.1998, lng: -8.0032, hours: "Closed (drive ended)", capacity: 10, host: "Mara Quillon", phone: "+00 555 0106" },
  { drive: "quay", name: "Boatshed yard", address: "1 Slipway", lat: 47.2309, lng: -7.9534, hours: "Weekdays 8:00–18:00", capacity: 5, host: "Pell Rudd", phone: "+00 555 0201" },
] as const;

// Glazing in inches, as the builders bought the sheets.
export const DEMO_HEATERS = [
  { drive: "winter", name: "Library reading room", width: 30, height: 60, coverage: "chamber", cols: 11, rows: 12, state: "claiming" },
  { drive: "winter", name: "Fernside cottage", width: 28, height: 74, coverage: "full", cols: 10, rows: 13, state: "planned" },
  { drive: "winter", name: "Scout hut", width: 30, height: 60, coverage: "chamber", cols: 11, rows: 12, state: "planned" },
  { drive: "winter", name: "Hillside cottage", width: 28, height: 74, coverage: "full", cols: 10, rows: 13, state: "planned" },
  { drive: "harvest", name: "Harvest workshop test panel", width: 24, height: 48, coverage: "chamber", cols: 9, rows: 9, state: "installed" },
  { drive: "quay", name: "Boatshed wall", width: 30, height: 60, coverage: "chamber", cols: 11, rows: 12, state: "planned" },
] as const;
