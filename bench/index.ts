/**
 * `npm run bench`: runs every benchmark in one process, one after the other, and prints their reports.
 * Benchmarks measure (rates, ratios against a reference in the same run); they never assert.
 * Run one alone: `node dist/bench/<name>.js`.
 */
const BENCHES = ["numerics", "thermo", "water", "language", "language_thermo", "display", "runner"] as const;

async function main(): Promise<void> {
  const only = process.argv.slice(2);
  for (const name of BENCHES) {
    if (only.length && !only.includes(name)) continue;
    let mod: { run?: () => Promise<void> | void };
    try {
      mod = (await import(`./${name}.js`)) as typeof mod;
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code === "ERR_MODULE_NOT_FOUND") continue;
      throw e;
    }
    if (typeof mod.run !== "function") continue;
    console.log(`\n=== bench: ${name} ===`);
    await mod.run();
  }
}

await main();
