/**
 * The fields the client actually sent. The shared update schemas are `.partial()` of bodies with defaults, so zod
 * fills an omitted `note` or `design` with '' — which would wipe the stored value on every partial update.
 */
export function onlySent<T extends Record<string, unknown>>(parsed: T, raw: unknown): Partial<T> {
  const sent = raw && typeof raw === 'object' ? raw : {};
  return Object.fromEntries(Object.entries(parsed).filter(([key]) => Object.hasOwn(sent, key))) as Partial<T>;
}
