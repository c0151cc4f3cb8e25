/** A record id as it appears in an address: a positive safe integer without sign, exponent or leading zero; anything else is null. */
export function parseId(text: string | undefined | null): number | null {
  if (!text || !/^[1-9]\d{0,15}$/.test(text)) return null;
  const n = Number(text);
  return Number.isSafeInteger(n) ? n : null;
}
