// The drive domain's query keys (re-exported by keys.ts), in a file of their own so the
// public drive page, which is held to a JavaScript budget, loads no other domain's keys.
export const driveKeys = {
  all: ["drives"] as const,
  list: () => [...driveKeys.all, "list"] as const,
  detail: (id: string) => [...driveKeys.all, "detail", id] as const,
  public: (slug: string) => [...driveKeys.all, "public", slug] as const,
  publicDropPoints: (slug: string) => [...driveKeys.public(slug), "drop-points"] as const,
};
