import Papa from "papaparse";
import { describe, expect, test } from "vitest";
import { orderGroupsToCsv } from "@/lib/jobs/order-csv";
import { groupOrders, supplierKey, type OrderPart } from "@/lib/jobs/order-list";

// DEVELOPERS.md "Money": integer minor units; a line is quantity × unit cost; a total is the sum of the lines.
// The sums below are worked by hand, in pence.

let id = 0;
const p = (
  jobNumber: number,
  designator: string,
  quantity: number,
  supplier: string | null,
  unitCostMinor: number | null,
  supplierPartNumber: string | null = null,
): OrderPart => ({
  id: ++id,
  jobId: 100 + jobNumber,
  jobNumber,
  jobTitle: `Set ${jobNumber}`,
  designator,
  kind: designator.startsWith("R") ? "resistor" : "electrolytic",
  originalValue: "50 µF",
  originalRating: "150 V",
  replacementValue: designator.startsWith("R") ? "2.2 MΩ" : "47 µF",
  replacementRating: designator.startsWith("R") ? "0.5 W" : "250 V",
  quantity,
  supplier,
  supplierPartNumber,
  unitCostMinor,
});

const parts = [
  p(3, "C5b", 2, "Valve Cellar", 210, "VC-47-250"), // 2 × 210 = 420
  p(3, "R7", 3, "Valve Cellar", 30), //                3 × 30 = 90
  p(3, "C9", 1, "Valve Cellar", null), //              no price: counted as unpriced, not as 0
  p(7, "C2", 1, "  valve  cellar ", 210, "vc-47-250"), // same supplier, same part number: 1 × 210 = 210
  p(7, "C4", 1, "Anode & Daughters", 1999), //         1 × 1999 = 1999
  p(1, "C1", 4, null, 25), //                          no supplier yet: 4 × 25 = 100
];

describe("the order list", () => {
  test("groups by supplier whatever the case and spacing, named suppliers A–Z then the rest", () => {
    expect(supplierKey("  valve  cellar ")).toBe(supplierKey("Valve Cellar"));
    const groups = groupOrders(parts, true);
    expect(groups.map((g) => g.supplier)).toEqual(["Anode & Daughters", "Valve Cellar", null]);
    expect(groups[1].lines.map((l) => `${l.jobNumber} ${l.designator}`)).toEqual(["3 C5b", "3 C9", "3 R7", "7 C2"]);
    expect(groups[1].jobCount).toBe(2);
  });

  test("totals in integer pence, worked by hand", () => {
    const [anode, cellar, none] = groupOrders(parts, true);
    expect(cellar.lines.map((l) => l.lineMinor)).toEqual([420, null, 90, 210]);
    expect(cellar.totalMinor).toBe(720); // 420 + 90 + 210
    expect(cellar.unpriced).toBe(1);
    expect(anode.totalMinor).toBe(1999);
    expect(none.totalMinor).toBe(100);
    for (const g of [anode, cellar, none]) expect(Number.isInteger(g.totalMinor)).toBe(true);
  });

  test("without prices (an apprentice) no amount is computed, even from costs present", () => {
    const groups = groupOrders(parts, false);
    expect(groups.every((g) => g.totalMinor === null && g.unpriced === 0)).toBe(true);
    expect(groups.flatMap((g) => g.lines).every((l) => l.lineMinor === null)).toBe(true);
  });

  test("the CSV puts one part number on one row, quantities added, prices as exact decimals", () => {
    const csv = orderGroupsToCsv(
      groupOrders(parts, true).filter((g) => g.key === "valve cellar"),
      "GBP",
    );
    const rows = Papa.parse<Record<string, string>>(csv, { header: true }).data;
    expect(Object.keys(rows[0])).toEqual(["supplier", "supplier_part_number", "description", "quantity", "unit_cost", "line_total", "for"]);
    const vc = rows.find((r) => r.supplier_part_number === "VC-47-250")!;
    expect(vc).toMatchObject({ supplier: "Valve Cellar", quantity: "3", unit_cost: "2.10", line_total: "6.30", for: "Job 3 C5b, Job 7 C2" });
    expect(vc.description).toBe("Electrolytic 47 µF 250 V");
    expect(rows.find((r) => r.for === "Job 3 C9")).toMatchObject({ unit_cost: "", line_total: "" });
    expect(rows.find((r) => r.for === "Job 3 R7")).toMatchObject({ quantity: "3", unit_cost: "0.30", line_total: "0.90" });
    expect(rows).toHaveLength(3);
  });

  test("other currencies keep their own decimals; without a currency the price columns are left out", () => {
    const yen = orderGroupsToCsv(groupOrders([p(1, "C1", 3, "Kiln Street", 150)], true), "JPY");
    expect(yen).toContain("Kiln Street,,Electrolytic 47 µF 250 V,3,150,450,Job 1 C1");
    const dinar = orderGroupsToCsv(groupOrders([p(1, "C1", 2, "Kiln Street", 1250)], true), "KWD");
    expect(dinar).toContain(",2,1.250,2.500,");
    const plain = orderGroupsToCsv(groupOrders(parts, false), null);
    expect(plain.split("\r\n")[0]).toBe("supplier,supplier_part_number,description,quantity,for");
    expect(plain).not.toMatch(/2\.10|19\.99/);
  });

  test("a supplier name a spreadsheet would run as a formula is neutralised", () => {
    const csv = orderGroupsToCsv(groupOrders([p(1, "C1", 1, "=HYPERLINK(1)", 100)], true), "GBP");
    expect(csv).toContain("'=HYPERLINK(1)");
  });
});
