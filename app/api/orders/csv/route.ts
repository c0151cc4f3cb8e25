import { getOrderList } from "@/db/queries/orders";
import { route } from "@/server/http/route";
import { orderGroupsToCsv } from "@/lib/jobs/order-csv";
import { supplierKey } from "@/lib/jobs/order-list";
import { orderCsvQuerySchema } from "@/lib/jobs/order-schemas";
import { downloadName } from "@/lib/jobs/download-name";

/** The order list as CSV for a supplier's order form: one supplier's rows with ?supplier=, else all. */
export const GET = route({ query: orderCsvQuerySchema }, ({ member, query }) => {
  const { currency, groups } = getOrderList(member);
  const chosen = query.supplier ? groups.filter((g) => g.key === supplierKey(query.supplier)) : groups;
  const slug = query.supplier
    ? supplierKey(query.supplier)
        .replace(/[^a-z0-9]+/g, "-")
        .replace(/^-|-$/g, "") || "supplier"
    : "all-suppliers";
  return new Response(`\uFEFF${orderGroupsToCsv(chosen, currency)}\r\n`, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": downloadName("attachment", `order-${slug}.csv`),
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
