import { expect, test } from "vitest";
import { benchHref, decodeInputs, encodeInputs } from "@/lib/calc/share";

test("inputs survive a round trip through the URL, lists as JSON", () => {
  const inputs = {
    resistance: "4.7k",
    capacitance: 4.7e-5,
    rectifier: "full-wave",
    cathodeBypassed: false,
    stages: [{ kind: "rc", resistance: 1000, capacitance: 2e-5 }],
  };
  const back = decodeInputs(new URLSearchParams(encodeInputs(inputs)));
  expect(back).toEqual({ ...inputs, capacitance: "0.000047" });
});

test("empty inputs are left out and the href has no dangling ?", () => {
  expect(benchHref("ohms-law", { voltage: "", current: undefined })).toBe("/bench/ohms-law");
  expect(benchHref("ohms-law", { voltage: 12 })).toBe("/bench/ohms-law?voltage=12");
});
