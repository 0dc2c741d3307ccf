import type { Look } from "./look";

// Apart from look.ts so the public drive page's client code takes the default
// without the settings form's lists (its JavaScript budget is tight).
export const DEFAULT_LOOK: Look = { timeZone: "Europe/London", locale: "en-GB", units: "metric" };
