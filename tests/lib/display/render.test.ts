import { inflateSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import { chartBundle, chartSpec, type ChartSpec } from "../../../lib/display/chart.js";
import { MIME } from "../../../lib/display/mime.js";
import { chartFontFiles, compileVegaLite, isPending, renderPending, renderPng, renderSvg } from "../../../lib/display/render.js";
import { tableBundle, tableFromColumns } from "../../../lib/display/table.js";

/** Minimal XML well-formedness: every element closes in order, one root, attributes quoted. */
function checkXml(xml: string): void {
  const stack: string[] = [];
  let roots = 0;
  const body = xml.replace(/<\?xml[^>]*\?>/, "").replace(/<!--[\s\S]*?-->/g, "");
  for (const m of body.matchAll(/<(\/?)([A-Za-z][\w:.-]*)((?:\s+[\w:.-]+="[^"]*")*)\s*(\/?)>|<|>/g)) {
    if (m[2] === undefined) throw new Error(`stray '${m[0]}' at ${m.index}`);
    if (m[1]) {
      const open = stack.pop();
      if (open !== m[2]) throw new Error(`</${m[2]}> closes <${open}> at ${m.index}`);
    } else if (!m[4]) {
      if (stack.length === 0) roots++;
      stack.push(m[2]);
    } else if (stack.length === 0) roots++;
  }
  if (stack.length) throw new Error(`unclosed <${stack.join("><")}>`);
  if (roots !== 1) throw new Error(`${roots} root elements`);
}

/** PNG structure per the PNG specification (ISO/IEC 15948): signature, IHDR, IDAT inflates to
 * height * (1 + width * bytesPerPixel) bytes. Returns size and raw scanlines. */
function decodePng(b64: string): { width: number; height: number; raw: Buffer } {
  const buf = Buffer.from(b64, "base64");
  expect([...buf.subarray(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
  let off = 8;
  let width = 0, height = 0, bpp = 0;
  const idat: Buffer[] = [];
  while (off < buf.length) {
    const len = buf.readUInt32BE(off);
    const type = buf.toString("latin1", off + 4, off + 8);
    const data = buf.subarray(off + 8, off + 8 + len);
    if (type === "IHDR") {
      width = data.readUInt32BE(0);
      height = data.readUInt32BE(4);
      const colour = data[9]!; // 6 = RGBA, 2 = RGB (bit depth 8 here)
      bpp = colour === 6 ? 4 : colour === 2 ? 3 : 0;
    }
    if (type === "IDAT") idat.push(data);
    off += 12 + len;
  }
  const raw = inflateSync(Buffer.concat(idat));
  expect(raw.length).toBe(height * (1 + width * bpp));
  return { width, height, raw };
}

const spec: ChartSpec = {
  title: "Methane isotherm",
  x: { title: "P", unit: "bar" },
  y: { title: "Z" },
  series: [{ label: "300 K", x: [1, 50, 100, 150], y: [0.998, 0.92, 0.86, 0.83] }],
};

describe("renderSvg", () => {
  it("renderSvg makes well-formed SVG with the axis titles and their units", async () => {
    const svg = await renderSvg(chartSpec(spec));
    checkXml(svg);
    expect(svg.startsWith("<svg")).toBe(true);
    expect(svg).toContain(">P [bar]</text>");
    expect(svg).toContain(">Z</text>");
    expect(svg).toContain(">Methane isotherm</text>");
    expect(svg).toContain('font-family="DejaVu Sans');
  });
  it("renderSvg draws a 1,000-point series as one path through every point", async () => {
    const n = 1000;
    const x = Array.from({ length: n }, (_, i) => 1 + i * 0.2);
    const b = chartBundle({ ...spec, x: { title: "P", unit: "bar", log: true }, series: [{ label: "a", x, y: x.map((p) => 1 - 0.001 * p) }] });
    const svg = await renderSvg(b[MIME.vegalite] as Record<string, unknown>);
    checkXml(svg);
    const line = /aria-roledescription="line mark" d="([^"]*)"/.exec(svg);
    expect(line).not.toBeNull();
    expect(line![1]!.match(/[ML]/g)!.length).toBe(n);
  });
});

describe("compileVegaLite", () => {
  it("compileVegaLite compiles our specs without warnings and refuses a warned spec", async () => {
    const two = { ...spec, series: [...spec.series, { label: "400 K", style: "PR", x: [1, 2], y: [1, 0.99] }] };
    await expect(compileVegaLite(chartSpec(two))).resolves.toHaveProperty("marks");
    await expect(compileVegaLite(chartSpec({ ...spec, mark: "line+point", x: { ...spec.x, log: true } }))).resolves.toBeTruthy();
    await expect(compileVegaLite(chartSpec({ ...spec, mark: "point", notes: ["a", "b"], y: { title: "Z", domain: [0, 2] } }))).resolves.toBeTruthy();
    // An encoding with an unknown type makes vega-lite warn; the wrapper turns that into an error.
    const bad = { ...chartSpec(spec), encoding: { x: { field: "x", type: "quantitative", aggregate: "nonsense" } } };
    await expect(compileVegaLite(bad)).rejects.toThrow(/Vega-Lite compiler reported/);
  });
});

describe("renderPng", () => {
  it("renderPng decodes, has the SVG's size, and draws text with the shipped font", async () => {
    const svg = await renderSvg(chartSpec(spec));
    const size = /width="(\d+)" height="(\d+)"/.exec(svg)!;
    const png = decodePng(await renderPng(svg));
    expect([png.width, png.height]).toEqual([Number(size[1]), Number(size[2])]);
    const noText = decodePng(await renderPng(svg.replace(/<text[^>]*>[^<]*<\/text>/g, "")));
    // If no font were found resvg would skip text silently and both pictures would be identical.
    expect(png.raw.equals(noText.raw)).toBe(false);
    const doubled = decodePng(await renderPng(svg, 2));
    expect(doubled.width).toBe(2 * png.width);
  });
  it("renderPng loads fonts from the package, not the system", () => {
    const files = chartFontFiles();
    expect(files).toHaveLength(2);
    for (const f of files) expect(f).toMatch(/dejavu-fonts-ttf[\\/]ttf[\\/]DejaVuSans(-Bold)?\.ttf$/);
  });
  it("renderPng rejects a bad scale", async () => {
    await expect(renderPng("<svg/>", 0)).rejects.toThrow(/pngScale must be in \(0, 8\], got 0/);
  });
});

describe("renderPending", () => {
  it("renderPending adds SVG and PNG to a chart bundle: every MIME type present", async () => {
    const b = chartBundle(spec);
    expect(isPending(b)).toBe(true);
    const done = await renderPending(b);
    expect(Object.keys(done).sort()).toEqual([MIME.png, MIME.svg, MIME.text, MIME.vegalite].sort());
    expect(isPending(done)).toBe(false);
    expect(await renderPending(done)).toBe(done);
  });
  it("renderPending leaves other bundles untouched and can skip the PNG", async () => {
    const t = tableBundle(tableFromColumns([{ name: "a", values: [1] }]));
    expect(await renderPending(t)).toBe(t);
    const noPng = await renderPending(chartBundle(spec), { png: false });
    expect(MIME.png in noPng).toBe(false);
    expect(MIME.svg in noPng).toBe(true);
  });
  it("renderPending keeps the output and says why when rendering fails", async () => {
    const broken = { [MIME.text]: "chart", [MIME.vegalite]: { mark: "nonsense-mark" } };
    const out = await renderPending(broken);
    expect(out[MIME.text]).toMatch(/^chart\n\(picture not rendered: .+\)$/);
    expect(MIME.svg in out).toBe(false);
  });
});

describe("render loading", () => {
  it("renderChart's libraries are imported lazily: no static import of vega, vega-lite or resvg in lib/display", async () => {
    const { readdirSync, readFileSync } = await import("node:fs");
    const dir = new URL("../../../lib/display/", import.meta.url);
    for (const f of readdirSync(dir).filter((n) => n.endsWith(".ts"))) {
      const src = readFileSync(new URL(f, dir), "utf8");
      expect(src, f).not.toMatch(/^\s*import\s[^;]*from\s+["'](vega|vega-lite|@resvg\/resvg-js)["']/m);
    }
  });
});
