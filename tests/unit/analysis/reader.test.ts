import fc from "fast-check";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { LogError } from "@/lib/analysis/errors";
import { type RowHandler, readRows, textChunks } from "@/lib/analysis/reader";

function collector() {
  const out: { line: number; fields: string[] }[] = [];
  const handler: RowHandler = {
    begin() {},
    rows(rows, count, firstLine) {
      for (let k = 0; k < count; k++) out.push({ line: firstLine + k, fields: [...(rows[k] as string[])] });
    },
    end() {},
  };
  return { out, handler };
}

async function read(chunks: Iterable<string | Uint8Array>, maxBytes?: number) {
  const c = collector();
  const summary = await readRows(chunks, c.handler, maxBytes);
  return { rows: c.out, summary };
}

const text =
  'Time (s),Voltage (V),Note\r\n0,16.8,"rest, then load"\r\n1,16.5,x\r\n\r\n2,16.4,"two\r\nlines"\r\n3,16.3,y\r\n';

describe("streaming reader (papaparse, chunk by chunk)", () => {
  it("gives the same rows wherever the chunks are cut, quotes and CRLF included", async () => {
    const whole = await read([text]);
    expect(whole.summary.dialect).toEqual({ delimiter: ",", newline: "\r\n", decimalComma: false });
    expect(whole.rows.map((r) => r.fields[2])).toEqual([
      "Note",
      "rest, then load",
      "x",
      undefined,
      "two\r\nlines",
      "y",
    ]);
    for (let cut = 1; cut < text.length; cut++) {
      const split = await read([text.slice(0, cut), text.slice(cut)]);
      expect(split.rows).toEqual(whole.rows);
    }
    for (const size of [1, 2, 3, 7]) expect((await read(textChunks(text, size))).rows).toEqual(whole.rows);
  });

  it("numbers lines from 1, blank lines included", async () => {
    const { rows } = await read(["a,b\n\n1,2\n"]);
    expect(rows.map((r) => r.line)).toEqual([1, 2, 3]);
    expect(rows[1]?.fields).toEqual([""]);
  });

  it("decodes UTF-8 bytes even when a character is split between chunks, and drops the BOM", async () => {
    const bytes = new TextEncoder().encode("\uFEFFTemp (°C),t\n25,0\n");
    const degree = bytes.indexOf(0xb0); // second byte of "°"
    const { rows } = await read([bytes.slice(0, degree), bytes.slice(degree)]);
    expect(rows[0]?.fields).toEqual(["Temp (°C)", "t"]);
  });

  it("drops a BOM from text input too", async () => {
    const { rows } = await read(["\uFEFFa,b\n1,2\n"]);
    expect(rows[0]?.fields[0]).toBe("a");
  });

  it("refuses a log over the size limit with a clear message, before reading it all", async () => {
    let pulled = 0;
    function* big() {
      for (let k = 0; k < 100; k++) {
        pulled++;
        yield "0,16.8,0\n".repeat(1000);
      }
    }
    await expect(read(big(), 50_000)).rejects.toThrowError(/larger than the limit of 0.05 MB/);
    expect(pulled).toBeLessThan(10);
  });

  it("refuses an empty log", async () => {
    await expect(read([""])).rejects.toBeInstanceOf(LogError);
    await expect(read(["\n\n  \n"])).rejects.toThrowError(/empty/);
  });

  it("accepts an async iterable of chunks", async () => {
    async function* gen() {
      yield "a,b\n1,";
      yield "2\n";
    }
    const c = collector();
    await readRows(gen(), c.handler);
    expect(c.out.map((r) => r.fields)).toEqual([
      ["a", "b"],
      ["1", "2"],
    ]);
  });
});

describe("two tokenizers, one result: udsv's fast path gives exactly papaparse's rows", () => {
  // Reference: papaparse (a general-purpose CSV library) on the whole text at once, with the dialect the
  // reader sniffed, less the empty row after a final line ending (which the reader never reports).
  function reference(textIn: string, dialect: { delimiter: string; newline: string }): string[][] {
    const body = textIn.charCodeAt(0) === 0xfeff ? textIn.slice(1) : textIn;
    const rows = Papa.parse<string[]>(body, {
      delimiter: dialect.delimiter,
      newline: dialect.newline as "\n",
      quoteChar: '"',
    }).data;
    const last = rows[rows.length - 1];
    if (last && last.length === 1 && last[0] === "") rows.pop();
    return rows;
  }

  const lineArb = fc.oneof(
    {
      weight: 300,
      arbitrary: fc.array(
        fc.oneof(
          fc.double({ min: -1e4, max: 1e4, noNaN: true }).map((x) => x.toFixed(3)),
          fc.constantFrom("", "REST", '"12,5"'),
        ),
        { minLength: 4, maxLength: 4 },
      ),
    },
    {
      weight: 2,
      arbitrary: fc.array(
        fc.string({ maxLength: 5 }).map((x) => x.replace(/"/g, "'")),
        { minLength: 0, maxLength: 6 },
      ),
    },
    {
      weight: 1,
      arbitrary: fc.constantFrom(
        [""],
        ["a", '"quoted, comma"', "x", "y"],
        ['"two', 'lines"', "1", "2"],
        ["1", "2", "3", "4", "5"],
        ['"a""b"', "1", "2", "3"],
        ["\uFEFF1", "2", "3", "4"],
      ),
    },
  );

  it("for any lines and any chunk splits (property, 400 logs of 800–2,000 lines)", async () => {
    let fast = 0;
    await fc.assert(
      fc.asyncProperty(
        fc.array(lineArb, { minLength: 800, maxLength: 2000 }),
        fc.constantFrom(",", ";", "\t"),
        fc.constantFrom("\n", "\r\n"),
        fc.boolean(),
        fc.array(fc.integer({ min: 16, max: 5000 }), { minLength: 1, maxLength: 8 }),
        fc.boolean(),
        async (lines, delimiter, newline, endsWithNewline, sizes, asBytes) => {
          const textIn = `Time,Voltage,Current,Mode${newline}${lines.map((fields) => fields.join(delimiter)).join(newline)}${endsWithNewline ? newline : ""}`;
          const whole = asBytes ? new TextEncoder().encode(textIn) : textIn;
          const chunks: (string | Uint8Array)[] = [];
          for (let at = 0, k = 0; at < whole.length; k++) {
            const size = sizes[k % sizes.length] ?? 1;
            chunks.push(whole.slice(at, at + size));
            at += size;
          }
          const { rows, summary } = await read(chunks);
          const expected = reference(textIn, summary.dialect);
          // Compared as text: a deep-equality diff of thousands of rows would dominate the run (and any shrinking).
          expect(JSON.stringify(rows.map((r) => r.fields))).toBe(JSON.stringify(expected));
          expect(rows.every((r, k) => r.line === k + 1)).toBe(true);
          fast += summary.fastBlocks;
        },
      ),
      { numRuns: 400, seed: 7070 },
    );
    expect(fast).toBeGreaterThan(100); // the fast path did most of the clean blocks
  });

  it("a clean 50,000-line log goes almost entirely through udsv, and gives papaparse's rows", async () => {
    const lines = Array.from(
      { length: 50_000 },
      (_, k) => `${(k * 0.1).toFixed(1)},${(16.8 - k * 1e-5).toFixed(5)},${k % 7 === 0 ? "12.5" : "12.4"}`,
    );
    const textIn = `Time (s),Voltage (V),Current (A)\n${lines.join("\n")}\n`;
    const { rows, summary } = await read(textChunks(textIn, 4096));
    expect(rows.map((r) => r.fields)).toEqual(reference(textIn, summary.dialect));
    expect(summary.fastBlocks).toBeGreaterThan(summary.papaBlocks * 20);
  });
});

describe("a stray quote", () => {
  it("is refused with its line once the open field passes 256 kB, instead of re-reading the rest of the log for every chunk", async () => {
    const body = Array.from({ length: 30_000 }, (_, k) => `${k},16.8,1.0`).join("\n");
    const textIn = `Time,Voltage,Current\n0,16.8,1.0\n1,"16.8,1.0\n${body}\n`;
    await expect(read(textChunks(textIn, 4096))).rejects.toMatchObject({ code: "unclosed-quote", line: 3 });
  });
});
