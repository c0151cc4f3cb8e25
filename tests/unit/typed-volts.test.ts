import { describe, expect, it } from "vitest";
import { highestTypedVoltage, typedHazard } from "@/lib/bench/typed-volts";
import { getCalculator } from "@/lib/calc/registry";
import { runCalculator } from "@/lib/calc/run";
import { HAZARD_VOLTS } from "@/lib/calc/safety";
import { parseQuantity } from "@/lib/calc/units";

// docs/PRODUCT.md "Safety rules": any voltage input above 50 V shows the danger caution, even while another
// field is invalid. The 50 V is lib/calc/safety.ts's HAZARD_VOLTS (IEC 61140's extra-low-voltage limit, AC).
const inputs = (slug: string) => getCalculator(slug)!.inputs;

describe("the typed voltage the danger banner follows", () => {
  it("reads a voltage field on its own while another field is invalid", () => {
    const raw = { supplyVoltage: "350 V", loadVoltage: "275", loadCurrent: "lots" };
    expect(runCalculator(getCalculator("dropping-resistor")!, raw).ok).toBe(false);
    const v = highestTypedVoltage(inputs("dropping-resistor"), raw);
    expect(v).toEqual({ label: "Supply voltage", volts: 350 });
    expect(typedHazard(v)).toBe(true);
  });

  it("finds a voltage inside a list (a heater's) and reads engineering text, decimal commas and kV", () => {
    const heaters = {
      lineVoltage: "",
      heaters: [
        { voltage: "12,6", current: "150m" },
        { voltage: "0.11 kV", current: "" },
      ],
    };
    expect(highestTypedVoltage(inputs("heater-string"), heaters)).toEqual({ label: "Heater 2 voltage", volts: 110 });
    expect(highestTypedVoltage(inputs("ohms-law"), { voltage: "-300" })?.volts).toBe(-300);
    expect(typedHazard(highestTypedVoltage(inputs("ohms-law"), { voltage: "-300" }))).toBe(true);
  });

  it("50 V itself, low voltages, blanks and text that is not a voltage do not fire it", () => {
    expect(typedHazard(highestTypedVoltage(inputs("ohms-law"), { voltage: `${HAZARD_VOLTS}` }))).toBe(false);
    expect(typedHazard(highestTypedVoltage(inputs("ohms-law"), { voltage: "50.001" }))).toBe(true);
    expect(typedHazard(highestTypedVoltage(inputs("ohms-law"), { voltage: "6.3 V" }))).toBe(false);
    expect(highestTypedVoltage(inputs("ohms-law"), { voltage: "", current: "900" })).toBeNull();
    expect(highestTypedVoltage(inputs("ohms-law"), { voltage: "350 A" })).toBeNull();
  });

  it("with the full parser, units only mathjs knows are read too", () => {
    expect(highestTypedVoltage(inputs("ohms-law"), { voltage: "0.35 kilovolt" })).toBeNull(); // quick reader: not yet
    expect(highestTypedVoltage(inputs("ohms-law"), { voltage: "0.35 kilovolt" }, parseQuantity)?.volts).toBeCloseTo(350, 9);
  });
});
