/**
 * One value per server process, kept on globalThis as `__glowbench<Name>`. Next.js loads a module once per
 * bundle (each route, instrumentation.ts) and again on every development reload, so a module-level variable
 * would open a second database or start a second sink. Tests that want a fresh one delete the property.
 */

const slots = globalThis as unknown as Record<string, unknown>;

export function processSingleton<T>(name: string, make: () => T): T {
  const key = `__glowbench${name}`;
  if (!(key in slots)) slots[key] = make();
  return slots[key] as T;
}

/** Forgets `name`'s value, so the next processSingleton call makes it again (a start that failed, retried). */
export function forgetProcessSingleton(name: string): void {
  delete slots[`__glowbench${name}`];
}

/**
 * The same for a client built from settings that may change while the process runs (the local sink and the
 * fake payment service fill theirs in after start): made again when `settings` differ from last time.
 */
export function processSingletonFor<T>(name: string, settings: string, make: () => T): T {
  const key = `__glowbench${name}`;
  const slot = slots[key] as { settings: string; value: T } | undefined;
  if (slot?.settings === settings) return slot.value;
  const value = make();
  slots[key] = { settings, value };
  return value;
}
