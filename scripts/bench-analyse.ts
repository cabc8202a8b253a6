/**
 * Benchmark of the log analysis (run: npm run bench:analyse).
 * Writes a 1,000,000-sample synthetic log (≈30 MB) to .bench/, then measures in this one run,
 * each round running every variant in turn and each figure the best of 7 rounds (the run least
 * disturbed by other processes):
 *   floor    — a bare byte scan of the file (read it, count newlines): the I/O floor;
 *   parse    — the analysis's reader alone (udsv for blocks of plain lines, papaparse for the rest),
 *              streaming the file (papaparse's own Node stream API is timed too, for reference);
 *   numbers  — the reader plus reading the four numbers of each row: the cost the analysis cannot avoid;
 *   analysis — the full analysis (parse + numbers + figures + curve);
 *   memory   — the analysis's peak memory above a baseline taken after a forced GC, sampled every
 *              5 ms as heapUsed + external + arrayBuffers (RSS shown beside it), in separate
 *              untimed runs so the sampler is not billed to the analysis's time.
 * Targets (issue 12): analysis ≤ 4 × the bare byte scan, peak memory ≤ 1 × file size. The last line is the summary.
 */
import { once } from "node:events";
import fs from "node:fs";
import path from "node:path";
import Papa from "papaparse";
import { DEFAULT_MAX_BYTES, analyseLog, readRows } from "../lib/analysis";
import { parseField } from "../lib/analysis/units";
import { csvChunks } from "../lib/synthetic/equivalent-circuit";

const SAMPLES = 1_000_000;
const ROUNDS = 7;
// npm runs scripts from the package root; .bench/ is git-ignored.
const dir = path.resolve(process.cwd(), ".bench");
const file = path.join(dir, "bench-1m.csv");
const gc = (globalThis as { gc?: () => void }).gc ?? (() => undefined);

async function writeLog(): Promise<number> {
  fs.mkdirSync(dir, { recursive: true });
  const out = fs.createWriteStream(file);
  const chunks = csvChunks(
    {
      seed: 7,
      cells: 6,
      capacityMah: 5000,
      cRate: 0.25,
      sampleIntervalS: 0.0125,
      iecPrelude: true,
      maxSamples: SAMPLES,
      noise: { voltageV: 0.002, currentA: 0.005, temperatureC: 0.05 },
    },
    { decimals: { time: 4 } },
    4096,
  );
  for (const chunk of chunks) if (!out.write(chunk)) await once(out, "drain");
  out.end();
  await once(out, "finish");
  return fs.statSync(file).size;
}

async function byteScan(): Promise<number> {
  let lines = 0;
  for await (const chunk of fs.createReadStream(file) as AsyncIterable<Buffer>) {
    for (let i = chunk.indexOf(10); i !== -1; i = chunk.indexOf(10, i + 1)) lines++;
  }
  return lines;
}

async function parseOnly(): Promise<number> {
  let rows = 0;
  await readRows(
    fs.createReadStream(file),
    {
      begin() {},
      rows(_r, count) {
        rows += count;
      },
      end() {},
    },
    DEFAULT_MAX_BYTES,
  );
  return rows;
}

/** The reader plus reading the four numbers of each row, nothing else: where the analysis's extra time goes. */
async function parseAndNumbers(): Promise<number> {
  const out = new Float64Array(4);
  const read = parseField;
  await readRows(
    fs.createReadStream(file),
    {
      begin() {},
      rows(rows, count) {
        for (let k = 0; k < count; k++) {
          const f = rows[k] as string[];
          out[0] = read(f[0], false);
          out[1] = read(f[1], false);
          out[2] = read(f[2], false);
          out[3] = read(f[3], false);
        }
      },
      end() {},
    },
    DEFAULT_MAX_BYTES,
  );
  return out[0] as number;
}

/** papaparse's own Node streaming entry point, for reference only. */
function papaNodeStream(): Promise<number> {
  return new Promise((resolve, reject) => {
    let rows = 0;
    Papa.parse(fs.createReadStream(file), {
      delimiter: ",",
      newline: "\n",
      chunk: (r: Papa.ParseResult<string[]>) => {
        rows += r.data.length;
      },
      complete: () => resolve(rows),
      error: reject,
    });
  });
}

/** The full analysis, timed bare: no sampler and no forced GC inside the timed span, as for parse. */
async function analyse(): Promise<number> {
  const result = await analyseLog(fs.createReadStream(file), { cells: 6, ratedMah: 5000 });
  return result.figures.samples;
}

/**
 * Peak memory of one analysis, in a run of its own: the 5 ms sampler (process.memoryUsage() reads
 * /proc and walks heap spaces) and the baseline GC would otherwise be billed to the analysis's time.
 */
async function analyseMemory(): Promise<{ samples: number; peakHeapB: number; peakRssB: number }> {
  gc();
  const base = process.memoryUsage();
  const baseHeap = base.heapUsed + base.external + base.arrayBuffers;
  let peakHeap = 0;
  let peakRss = 0;
  const sample = () => {
    const m = process.memoryUsage();
    peakHeap = Math.max(peakHeap, m.heapUsed + m.external + m.arrayBuffers - baseHeap);
    peakRss = Math.max(peakRss, m.rss - base.rss);
  };
  const timer = setInterval(sample, 5);
  try {
    const samples = await analyse();
    sample();
    return { samples, peakHeapB: peakHeap, peakRssB: peakRss };
  } finally {
    clearInterval(timer);
  }
}

async function timed<T>(fn: () => Promise<T>): Promise<{ ms: number; value: T }> {
  gc();
  const t0 = process.hrtime.bigint();
  const value = await fn();
  return { ms: Number(process.hrtime.bigint() - t0) / 1e6, value };
}

async function main(): Promise<void> {
  if (!(globalThis as { gc?: unknown }).gc)
    console.log("note: run with --expose-gc (npm run bench:analyse) for a clean memory baseline");
  const t0 = Date.now();
  const bytes = await writeLog();
  console.log(
    `log: ${path.relative(process.cwd(), file)} — ${(bytes / 1e6).toFixed(1)} MB, ${SAMPLES.toLocaleString("en")} samples (written in ${((Date.now() - t0) / 1000).toFixed(1)} s)`,
  );
  const runs: Record<string, number[]> = { scan: [], parse: [], numbers: [], papa: [], full: [] };
  let peakHeapB = 0;
  let peakRssB = 0;
  await timed(analyse); // warm-up: JIT and file cache
  await timed(parseOnly);
  for (let round = 0; round < ROUNDS; round++) {
    runs.scan?.push((await timed(byteScan)).ms);
    runs.parse?.push((await timed(parseOnly)).ms);
    runs.numbers?.push((await timed(parseAndNumbers)).ms);
    runs.papa?.push((await timed(papaNodeStream)).ms);
    const a = await timed(analyse);
    runs.full?.push(a.ms);
    if (a.value !== SAMPLES) throw new Error(`analysis read ${a.value} samples, expected ${SAMPLES}`);
  }
  // Memory in runs of their own (see analyseMemory), the worst of a few.
  for (let round = 0; round < 3; round++) {
    const m = await analyseMemory();
    if (m.samples !== SAMPLES) throw new Error(`analysis read ${m.samples} samples, expected ${SAMPLES}`);
    peakHeapB = Math.max(peakHeapB, m.peakHeapB);
    peakRssB = Math.max(peakRssB, m.peakRssB);
  }
  // Best of N: the run least disturbed by other processes on a shared 2-core machine.
  const best = (key: string) => Math.min(...(runs[key] ?? [Number.NaN]));
  const row = (name: string, key: string) =>
    console.log(
      `  ${name.padEnd(46)} ${best(key).toFixed(0).padStart(5)} ms   (all runs: ${(runs[key] ?? []).map((x) => x.toFixed(0)).join(", ")})`,
    );
  console.log(`timings, best of ${ROUNDS} rounds (each round runs all five in turn):`);
  row("bare byte scan of the file (floor)", "scan");
  row("the analysis's reader alone (udsv + papaparse)", "parse");
  row("reader + reading 4 numbers per row, no more", "numbers");
  row("papaparse's own Node stream API (reference)", "papa");
  row("full analysis", "full");
  const floorRatio = best("full") / best("scan");
  const memory = peakHeapB / bytes;
  console.log(
    `peak memory during analysis above a post-GC baseline: heapUsed+external+arrayBuffers ${(peakHeapB / 1e6).toFixed(1)} MB (RSS ${(peakRssB / 1e6).toFixed(1)} MB), file ${(bytes / 1e6).toFixed(1)} MB`,
  );
  console.log(
    `analysis ÷ reader alone: ${(best("full") / best("parse")).toFixed(2)}; reader ÷ papaparse's stream API: ${(best("parse") / best("papa")).toFixed(2)}; number conversion alone costs ${((best("numbers") - best("parse")) / best("parse")).toFixed(2)} × the reader`,
  );
  console.log(
    `targets: analysis ≤ 4 × byte scan ${floorRatio <= 4 ? "met" : "NOT met"}; peak memory ≤ 1 × file ${memory <= 1 ? "met" : "NOT met"} (memory = heapUsed+external+arrayBuffers)`,
  );
  console.log(
    `analysis/scan ratio: ${floorRatio.toFixed(2)}, peak memory: ${memory.toFixed(2)} x file, analysis/reader ratio: ${(best("full") / best("parse")).toFixed(2)}`,
  );
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : String(error));
  process.exit(1);
});
