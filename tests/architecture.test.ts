/**
 * architecture: enforces DESIGN.md section 3 (which folder may import which) and the rule that every
 * source file with runtime code has its mirrored test (kernel/x/y.ts -> tests/kernel/x/y.test.ts).
 * Reads the source as text; it never runs it.
 */
import { readFileSync, readdirSync, statSync, existsSync } from "node:fs";
import { dirname, join, relative, resolve, sep } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");

/** Top-level units of the dependency table. A file belongs to the longest prefix that matches. */
const UNITS = [
  "lib/numerics", "lib/thermo", "lib/units", "lib/display", "lib/language",
  "kernel/wire", "kernel/protocol", "kernel/handlers", "kernel/execution", "kernel/engine", "kernel/runner",
  "kernel/main.ts", "kernel/cli.ts", "kernel/install.ts",
] as const;
type Unit = (typeof UNITS)[number];

const KERNEL_ALL: Unit[] = ["kernel/wire", "kernel/protocol", "kernel/handlers", "kernel/execution", "kernel/engine", "kernel/runner", "kernel/main.ts", "kernel/cli.ts", "kernel/install.ts"];

/** May import (units and packages). node: built-ins are allowed where `node` is true. */
const RULES: Record<Unit, { units: Unit[]; packages: string[]; node: boolean }> = {
  "lib/numerics": { units: [], packages: [], node: false },
  "lib/thermo": { units: ["lib/numerics"], packages: [], node: false },
  "lib/units": { units: [], packages: ["mathjs"], node: false },
  // Rendering libraries only; the PNG copy needs resvg and a font shipped as a package.
  "lib/display": { units: [], packages: ["vega", "vega-lite", "@resvg/resvg-js", "@fontsource/*", "dejavu-fonts-ttf"], node: true },
  "lib/language": { units: ["lib/units", "lib/thermo", "lib/numerics", "lib/display"], packages: ["mathjs"], node: true },
  "kernel/wire": { units: [], packages: ["zeromq"], node: true },
  "kernel/protocol": { units: [], packages: ["@jupyterlab/services"], node: true },
  "kernel/execution": { units: ["kernel/protocol"], packages: [], node: true },
  "kernel/handlers": { units: ["kernel/protocol", "kernel/execution", "kernel/engine"], packages: [], node: true },
  // The engine hosts the language and finishes display bundles (async chart rendering) before sending.
  // tsx only under the test runner, where the worker must load TypeScript sources.
  "kernel/engine": { units: ["kernel/protocol", "lib/language", "lib/display"], packages: ["tsx"], node: true },
  // The runner reads design-check rows by the MIME type defined once in lib/display.
  "kernel/runner": { units: ["kernel/wire", "kernel/protocol", "kernel/engine", "lib/display"], packages: ["marked"], node: true },
  "kernel/main.ts": { units: KERNEL_ALL, packages: [], node: true },
  "kernel/cli.ts": { units: KERNEL_ALL, packages: [], node: true },
  // `caloric install`: writes the kernelspec; needs only the protocol's names.
  "kernel/install.ts": { units: ["kernel/protocol"], packages: [], node: true },
};

function walk(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir).flatMap((name) => {
    const full = join(dir, name);
    return statSync(full).isDirectory() ? walk(full) : full.endsWith(".ts") && !full.endsWith(".d.ts") ? [full] : [];
  });
}

const rel = (p: string) => relative(root, p).split(sep).join("/");
const unitOf = (path: string): Unit | undefined =>
  [...UNITS].sort((a, b) => b.length - a.length).find((u) => path === u || path.startsWith(u + "/"));

const sources = [...walk(join(root, "kernel")), ...walk(join(root, "lib"))].map(rel);

/** Import specifiers, with whether the import is type-only. Comments are stripped first. */
function importsOf(text: string): { spec: string; typeOnly: boolean }[] {
  const code = text.replace(/\/\*[\s\S]*?\*\//g, "").replace(/(^|[^:"'`])\/\/.*$/gm, "$1");
  const found: { spec: string; typeOnly: boolean }[] = [];
  const re = /(?:^|\n)\s*(import|export)\s+(type\s+)?(?:[^'"`;]*?\sfrom\s+)?["']([^"']+)["']|import\(\s*["']([^"']+)["']\s*\)/g;
  for (const m of code.matchAll(re)) {
    const spec = m[3] ?? m[4];
    if (spec) found.push({ spec, typeOnly: Boolean(m[2]) });
  }
  return found;
}

function packageName(spec: string): string {
  const parts = spec.split("/");
  return spec.startsWith("@") ? parts.slice(0, 2).join("/") : parts[0]!;
}

const allowsPackage = (allowed: string[], pkg: string) =>
  allowed.some((a) => a === pkg || (a.endsWith("/*") && pkg.startsWith(a.slice(0, -1))));

/** True when a file has runtime code (not only types, interfaces and re-exports). */
function hasRuntimeCode(text: string): boolean {
  const code = text.replace(/\/\*[\s\S]*?\*\//g, "").replace(/\/\/.*$/gm, "");
  return /^\s*(export\s+)?(default\s+)?(async\s+)?(function|class|const|let|var|enum)\b/m.test(code);
}

describe("architecture", () => {
  it("importsOf finds value, type-only and dynamic imports (self-check of the scanner)", () => {
    const sample = 'import { a } from "./x.js";\nimport type { B } from "@jupyterlab/services";\nconst v = await import("vega");\n// import "ignored"';
    expect(importsOf(sample)).toEqual([
      { spec: "./x.js", typeOnly: false },
      { spec: "@jupyterlab/services", typeOnly: true },
      { spec: "vega", typeOnly: false },
    ]);
  });

  it("every source file belongs to a unit of the dependency table", () => {
    const orphans = sources.filter((s) => !unitOf(s));
    expect(orphans).toEqual([]);
  });

  it("imports follow DESIGN.md section 3 and cross folders only through index.ts", () => {
    const violations: string[] = [];
    for (const file of sources) {
      const unit = unitOf(file)!;
      const rule = RULES[unit];
      for (const { spec } of importsOf(readFileSync(join(root, file), "utf8"))) {
        if (spec.startsWith(".")) {
          const target = rel(resolve(root, dirname(file), spec)).replace(/\.js$/, ".ts");
          const targetUnit = unitOf(target);
          if (targetUnit === unit) continue;
          if (!targetUnit || !rule.units.includes(targetUnit)) {
            violations.push(`${file}: imports ${spec} (${targetUnit ?? "outside kernel/ and lib/"}), not allowed for ${unit}`);
          } else if (target !== `${targetUnit}/index.ts` && target !== targetUnit) {
            violations.push(`${file}: imports ${spec}; cross-folder imports go through ${targetUnit}/index.ts`);
          }
        } else if (spec.startsWith("node:")) {
          if (!rule.node) violations.push(`${file}: imports ${spec}; ${unit} must stay free of Node built-ins`);
        } else if (!allowsPackage(rule.packages, packageName(spec))) {
          violations.push(`${file}: imports package ${spec}, not allowed for ${unit}`);
        }
      }
    }
    expect(violations).toEqual([]);
  });

  it("kernel/protocol imports @jupyterlab/services for types only", () => {
    const bad = sources
      .filter((f) => unitOf(f) === "kernel/protocol")
      .flatMap((f) => importsOf(readFileSync(join(root, f), "utf8")).filter((i) => i.spec.startsWith("@jupyterlab/") && !i.typeOnly).map((i) => `${f}: ${i.spec}`));
    expect(bad).toEqual([]);
  });

  it("every source file with runtime code has its mirrored test", () => {
    const missing = sources
      .filter((f) => !/(^|\/)index\.ts$/.test(f) && hasRuntimeCode(readFileSync(join(root, f), "utf8")))
      .map((f) => `tests/${f.replace(/\.ts$/, ".test.ts")}`)
      .filter((t) => !existsSync(join(root, t)));
    expect(missing).toEqual([]);
  });
});
