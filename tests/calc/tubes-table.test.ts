import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { findHeater } from "@/lib/calc/tables/heaters";
import { findRectifier } from "@/lib/calc/tables/rectifiers";
import { TRIODES } from "@/lib/calc/tables/triodes";
import { PICTURE_TUBES, RECEIVING_TUBES, TUBES, TUBE_TYPES, findTube, tubeHeater, type ReceivingTube } from "@/lib/calc/tables/tubes";

const rx = (type: string) => {
  const t = findTube(type);
  if (!t || t.category !== "receiving") throw new Error(`${type} is not a receiving tube of the table`);
  return t;
};

describe("tube table: data-sheet figures (all from memory)", () => {
  it("6V6GT: 12 W plate, 2 W screen, 315 V; the 6V6GTA is rated higher", () => {
    // RCA receiving tube manual (RC-series), 6V6GT and 6V6GTA — from memory
    const t = rx("6V6GT");
    expect([t.maxPlateVoltage, t.maxPlateDissipation, t.maxScreenDissipation]).toEqual([315, 12, 2]);
    expect(t.kind).toBe("beam power");
    expect(t.base).toBe("octal");
    expect(rx("6V6GTA").maxPlateDissipation).toBeGreaterThan(t.maxPlateDissipation);
  });

  it("6L6GC: 30 W plate, 5 W screen, 500 V — far above the 6L6's 19 W", () => {
    // RCA 6L6GC and 6L6 data — from memory
    const t = rx("6l6gc");
    expect([t.maxPlateVoltage, t.maxPlateDissipation, t.maxScreenDissipation]).toEqual([500, 30, 5]);
    expect(rx("6L6G").maxPlateDissipation).toBe(19);
  });

  it("EL84/6BQ5: 12 W plate, 2 W screen, 300 V, on a noval base; EL34: 25 W and 8 W", () => {
    // EL84 and EL34 data sheets — from memory
    const t = rx("EL84");
    expect(t.type).toBe("6BQ5");
    expect([t.maxPlateVoltage, t.maxPlateDissipation, t.maxScreenDissipation, t.base]).toEqual([300, 12, 2, "9-pin noval"]);
    expect([rx("EL34").maxPlateDissipation, rx("EL34").maxScreenDissipation]).toEqual([25, 8]);
  });

  it("12AX7: 1 W per section, 300 V; 12AU7 2.75 W; directly heated 2A3 15 W on a 2.5 V 2.5 A filament", () => {
    // RCA data for 12AX7, 12AU7 and 2A3 — from memory
    expect(rx("ECC83")).toMatchObject({ type: "12AX7", sections: 2, maxPlateDissipation: 1, maxPlateVoltage: 300 });
    expect(rx("12AU7").maxPlateDissipation).toBe(2.75);
    const t = rx("2A3");
    expect([t.heating, t.maxPlateDissipation]).toEqual(["filament", 15]);
    expect(tubeHeater(t)).toEqual({ voltage: 2.5, current: 2.5 });
  });

  it("the horizontal output tube's DC plate rating is a tenth of the pulse its plate sees", () => {
    // RCA 6BQ6GT data: 550 V DC, 6000 V peak positive pulse — from memory
    const t = rx("6BQ6");
    expect(t.type).toBe("6BQ6GT");
    expect(t.maxPeakPulseVoltage! / t.maxPlateVoltage!).toBeGreaterThan(10);
    expect(rx("6AU4GT").maxPeakInverseVoltage).toBe(4500);
  });

  it("picture tubes: 17BP4A rectangular, 70°, magnetic focus, 6.3 V 0.6 A heater", () => {
    // RCA picture tube data, 17BP4A — from memory
    const t = findTube("17bp4a")!;
    expect(t.category).toBe("picture");
    if (t.category !== "picture") return;
    expect([t.face, t.deflectionAngle, t.focus]).toEqual(["rectangular", 70, "magnetic"]);
    expect(tubeHeater(t)).toEqual({ voltage: 6.3, current: 0.6 });
    expect(findTube("17BP4")).toBeUndefined(); // a revision letter is never guessed
  });
});

describe("tube table: consistency", () => {
  it("every type the table promises is found; no rectifier is duplicated here", () => {
    const wanted =
      "6V6GT 6L6GC 6F6 6K6GT 6AQ5 6BQ5 EL84 EL34 6CA7 6550 KT66 6BQ6 6DQ6 6AU4 35C5 50C5 50L6GT 25L6GT " +
      "6SN7GT 12AX7 12AU7 12AT7 6SL7GT 6J5 2A3 300B 45 6BA6 6BE6 6AV6 6SK7 6SA7 6SQ7 6AU6 10BP4 12LP4 17BP4A 21YP4";
    for (const n of wanted.split(" ")) expect(findTube(n), n).toBeDefined();
    for (const t of TUBES) for (const n of [t.type, ...t.aliases]) expect(findRectifier(n), n).toBeUndefined();
  });

  it("every receiving row is complete, positive and finite, and names its source", () => {
    for (const t of RECEIVING_TUBES) {
      expect(t.maxPlateDissipation > 0 && t.maxPlateDissipation <= 100, t.type).toBe(true);
      if (t.kind === "damper diode") expect(t.maxPeakInverseVoltage).toBeGreaterThan(1000);
      else expect(t.maxPlateVoltage! > 50 && t.maxPlateVoltage! <= 1000, t.type).toBe(true);
      expect(t.source).toMatch(/data sheet|manual|data/i);
      expect(t.source).toMatch(/from memory/);
    }
  });

  it("screen ratings belong to tubes with a screen grid, and stay below the plate's", () => {
    const screened = new Set(["sharp-cutoff pentode", "remote-cutoff pentode", "pentagrid converter", "power pentode", "beam power"]);
    for (const t of RECEIVING_TUBES) {
      expect(t.maxScreenDissipation !== undefined, t.type).toBe(screened.has(t.kind));
      if (t.maxScreenDissipation !== undefined) expect(t.maxScreenDissipation).toBeLessThanOrEqual(t.maxPlateDissipation);
    }
  });

  it("every tube has a heater: from heaters.ts where it lists the type, agreeing with any figure carried here", () => {
    let fromHeaterTable = 0;
    for (const t of TUBES) {
      const hv = tubeHeater(t);
      expect(hv, t.type).toBeDefined();
      expect(hv!.voltage > 0 && hv!.current > 0).toBe(true);
      const listed = [t.type, ...t.aliases].map(findHeater).find(Boolean);
      if (listed) {
        fromHeaterTable++;
        if (t.heater) expect(t.heater, t.type).toEqual({ voltage: listed.voltage, current: listed.current });
      } else expect(t.heater, `${t.type} needs its own heater`).toBeDefined();
    }
    expect(fromHeaterTable).toBeGreaterThanOrEqual(25);
  });

  it("plate dissipation per section agrees with the triode model table wherever both list the type", () => {
    // lib/calc/tables/triodes.ts gives the lower rating of a type's suffixes; the base type matches it here
    let compared = 0;
    for (const m of TRIODES) {
      const t = findTube(m.name) as ReceivingTube | undefined;
      if (!t) continue;
      compared++;
      expect(t.maxPlateDissipation, m.name).toBe(m.maxPlateDissipation);
    }
    expect(compared).toBeGreaterThanOrEqual(4);
  });

  it("picture tubes: anode range ordered and in kilovolts, a plausible angle, the size in the type number", () => {
    // RETMA picture-tube numbering: the leading digits are the nominal screen size in inches (common practice)
    for (const t of PICTURE_TUBES) {
      expect(t.anodeVoltageMin).toBeLessThan(t.anodeVoltageMax);
      expect(t.anodeVoltageMin).toBeGreaterThanOrEqual(5000);
      expect(t.anodeVoltageMax).toBeLessThanOrEqual(30000);
      expect(t.deflectionAngle >= 40 && t.deflectionAngle <= 114).toBe(true);
      expect(Number.parseInt(t.type, 10)).toBeGreaterThanOrEqual(7);
      expect(t.source).toMatch(/from memory/);
    }
    expect(PICTURE_TUBES.some((t) => t.face === "round") && PICTURE_TUBES.some((t) => t.face === "rectangular")).toBe(true);
  });

  it("type names are unique, and each is found by its own name and aliases", () => {
    const all = TUBES.flatMap((t) => [t.type, ...t.aliases]);
    expect(new Set(all.map((n) => n.toUpperCase())).size).toBe(all.length);
    expect(TUBE_TYPES).toEqual(TUBES.map((t) => t.type));
    for (const t of TUBES) for (const n of [t.type, ...t.aliases]) expect(findTube(n)).toBe(t);
  });
});

describe("findTube", () => {
  it("reads names as the trade writes them: any case, spaces or hyphens, a G or GT envelope suffix", () => {
    expect(findTube(" 6v6-gt ")!.type).toBe("6V6GT");
    expect(findTube("6K6")!.type).toBe("6K6GT");
    expect(findTube("6J5G")!.type).toBe("6J5");
    expect(findTube("6AU4")!.type).toBe("6AU4GT");
    expect(findTube("6L6GB")!.type).toBe("6L6");
    expect(findTube("6AQ5B")).toBeUndefined(); // revisions are never guessed
    expect(findTube("5Y3GT")).toBeUndefined(); // rectifiers live in their own table
    expect(findTube("")).toBeUndefined();
  });

  it("property: case and separators never change the answer", () => {
    const name = fc.constantFrom(...TUBES.flatMap((t) => [t.type, ...t.aliases]));
    fc.assert(
      fc.property(name, fc.array(fc.boolean(), { minLength: 8, maxLength: 8 }), fc.constantFrom("", " ", "-"), (n, cases, sep) => {
        const mangled = [...n].map((ch, i) => (cases[i % 8] ? ch.toLowerCase() : ch)).join("");
        const withSep = mangled.length > 2 ? `${mangled.slice(0, 2)}${sep}${mangled.slice(2)}` : mangled;
        expect(findTube(withSep)).toBe(findTube(n));
      }),
    );
  });
});
