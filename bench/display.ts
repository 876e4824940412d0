/**
 * Display benchmark: a 1,000-point chart bundle (spec + SVG, and the PNG copy separately) and a
 * 200-row table; first chart (pays for loading vega, vega-lite, resvg) vs subsequent ones.
 * Target (issue 7): a subsequent 1,000-point chart under 150 ms. Measures, never asserts.
 * Run alone: `node dist/bench/display.js`.
 */
import { pathToFileURL } from "node:url";
import { chartBundle, MIME, renderPending, tableBundle, tableFromColumns } from "../lib/display/index.js";

const ms = (t0: number) => performance.now() - t0;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

function thousandPoints(shift: number) {
  const x = Array.from({ length: 1000 }, (_, i) => 0.1 * 1.0046 ** i);
  return chartBundle({
    title: "1,000-point sweep",
    x: { title: "P", unit: "bar", log: true },
    y: { title: "Z" },
    series: [{ label: "300 K", x, y: x.map((p) => 1 - 0.002 * p + shift * 1e-6) }],
  });
}

export async function run(): Promise<void> {
  let t0 = performance.now();
  const first = await renderPending(thousandPoints(0), { png: false });
  const firstSvg = ms(t0);
  if (!(MIME.svg in first)) throw new Error("bench: first chart did not render");

  const svgTimes: number[] = [];
  const fullTimes: number[] = [];
  for (let k = 1; k <= 7; k++) {
    t0 = performance.now();
    await renderPending(thousandPoints(k), { png: false });
    svgTimes.push(ms(t0));
    t0 = performance.now();
    await renderPending(thousandPoints(k));
    fullTimes.push(ms(t0));
  }

  const n = 200;
  const columns = [
    { name: "P", unit: "bar", values: Array.from({ length: n }, (_, i) => 1 + i * 0.5) },
    { name: "T", unit: "K", values: Array.from({ length: n }, (_, i) => 280 + i * 0.37) },
    { name: "Z", values: Array.from({ length: n }, (_, i) => 1 - i * 0.0013) },
    { name: "H", unit: "J/mol", values: Array.from({ length: n }, (_, i) => -1234.5 * Math.sqrt(i)) },
    { name: "phase", values: Array.from({ length: n }, () => "vapor") },
  ];
  const tableTimes: number[] = [];
  for (let k = 0; k < 9; k++) {
    t0 = performance.now();
    tableBundle(tableFromColumns(columns));
    tableTimes.push(ms(t0));
  }

  const f = (x: number) => `${x.toFixed(1)} ms`;
  console.log(`first 1,000-point chart (spec + SVG, incl. loading vega): ${f(firstSvg)}`);
  console.log(`subsequent 1,000-point chart, spec + SVG (median of 7):  ${f(median(svgTimes))}  target < 150 ms`);
  console.log(`subsequent 1,000-point chart, spec + SVG + PNG (median):  ${f(median(fullTimes))}`);
  console.log(`first / subsequent (SVG): ${(firstSvg / median(svgTimes)).toFixed(1)}x`);
  console.log(`200-row table, 5 columns, text + HTML + markdown (median of 9): ${f(median(tableTimes))}`);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) await run();
