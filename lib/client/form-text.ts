/**
 * An edit form's starting text: each named field of the record as the text typed into it, or "" where
 * it has no value (or when there is no record: a new one).
 */
export function formText<N extends string>(names: readonly N[], record?: Partial<Record<N, string | number | null>>): Record<N, string> {
  return Object.fromEntries(names.map((n) => [n, record?.[n] == null ? "" : String(record[n])])) as Record<N, string>;
}
