/**
 * The parsed fields of a patch that the caller actually sent. A patch schema built with
 * `.partial()` still fills in the fields' defaults, which would quietly reset them; this keeps
 * only the keys present in the raw body.
 */
export function providedFields<T extends object>(parsed: T, body: unknown): Partial<T> {
  const sent = body && typeof body === "object" ? new Set(Object.keys(body)) : new Set<string>();
  return Object.fromEntries(Object.entries(parsed).filter(([key]) => sent.has(key))) as Partial<T>;
}
