/**
 * `npm run bench`: the calculator micro-benchmark, then the Bench pages' speed and accessibility
 * (Lighthouse, first-load JS, keystroke-to-result). Add `--json` for one JSON report.
 */
import { formatReport, runCalcBench } from "./calc-bench";
import { run as runUiBench } from "./ui-bench";

async function main() {
  const calc = await runCalcBench();
  const ui = await runUiBench();
  if (process.argv.includes("--json")) {
    console.log(JSON.stringify({ calc, ui }, null, 2));
    return;
  }
  console.log(formatReport(calc));
  console.log("\nBench pages\n" + JSON.stringify(ui, null, 2));
}

main().catch((err) => {
  console.error(err);
  process.exitCode = 1;
});
