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

const text = 'Time (s),Voltage (V),Note\r\n0,16.8,"rest, then load"\r\n1,16.5,x\r\n\r\n2,16.4,"two\r\nlines"\r\n3,16.3,y\r\n';

describe("streaming reader (papaparse, chunk by chunk)", () => {
  it("gives the same rows wherever the chunks are cut, quotes and CRLF included", async () => {
    const whole = await read([text]);
    expect(whole.summary.dialect).toEqual({ delimiter: ",", newline: "\r\n", decimalComma: false });
    expect(whole.rows.map((r) => r.fields[2])).toEqual(["Note", "rest, then load", "x", undefined, "two\r\nlines", "y"]);
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
    expect(c.out.map((r) => r.fields)).toEqual([["a", "b"], ["1", "2"]]);
  });
});
