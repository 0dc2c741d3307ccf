// Intl formatters are costly to build and cheap to reuse: one per locale and options.
const made = new Map<string, unknown>();

export function memo<T>(kind: string, locale: string, options: object, make: () => T): T {
  const key = `${kind}|${locale}|${JSON.stringify(options)}`;
  if (!made.has(key)) made.set(key, make());
  return made.get(key) as T;
}
