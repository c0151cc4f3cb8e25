/**
 * Choke DC resistance used when none is given. Receiver and amplifier filter chokes of 5–10 H at
 * 50–200 mA measure roughly 50–300 Ω (common practice); 100 Ω sits in that range, on the low side,
 * so a resonant peak is not understated. The form asks the person to measure theirs. Kept apart from
 * ripple-stages.ts so the Bench form can show it without bundling the schema and unit parser.
 */
export const DEFAULT_CHOKE_RESISTANCE = 100;
