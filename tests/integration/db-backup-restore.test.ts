// npm run db:backup / db:restore round trip: a dump of the throwaway database restored into a second
// database gives back the same rows.
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { Client } from "pg";
import { afterAll, describe, expect, inject, it } from "vitest";
import { db } from "@/db";
import { makers, packs } from "@/db/schema";

const source = inject("databaseUrl");
const targetName = `${new URL(source).pathname.slice(1)}_restore`;
const target = source.replace(/\/[^/]+$/, `/${targetName}`);
const admin = source.replace(/\/[^/]+$/, "/postgres");
const root = path.resolve(__dirname, "../..");

async function sql(url: string, text: string) {
  const c = new Client({ connectionString: url });
  await c.connect();
  try {
    return (await c.query(text)).rows;
  } finally {
    await c.end();
  }
}

afterAll(async () => {
  await sql(admin, `DROP DATABASE IF EXISTS ${targetName} WITH (FORCE)`);
});

describe("database backup and restore", () => {
  it("restores a dump into another database with the same rows", async () => {
    const [maker] = await db.insert(makers).values({ slug: "backup-maker", name: "Backup Maker" }).returning();
    if (!maker) throw new Error("no maker");
    await db.insert(packs).values({
      slug: "backup-pack",
      makerId: maker.id,
      model: "B 2200 3S 40C",
      cellsInSeries: 3,
      ratedCapacityMah: 2200,
      labelledContinuousC: 40,
      connector: "XT60",
    });
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "sagline-backup-")), "test.dump");
    execFileSync("bash", ["scripts/db-backup.sh", file], {
      cwd: root,
      env: { ...process.env, DATABASE_URL: source },
      stdio: "pipe",
    });
    expect(fs.statSync(file).size).toBeGreaterThan(1000);

    await sql(admin, `DROP DATABASE IF EXISTS ${targetName} WITH (FORCE)`);
    await sql(admin, `CREATE DATABASE ${targetName}`);
    execFileSync("bash", ["scripts/db-restore.sh", file], {
      cwd: root,
      env: { ...process.env, DATABASE_URL: target },
      stdio: "pipe",
    });
    const restored = await sql(
      target,
      "select p.slug, m.name from packs p join makers m on m.id = p.maker_id where p.slug = 'backup-pack'",
    );
    expect(restored).toEqual([{ slug: "backup-pack", name: "Backup Maker" }]);
    const [a] = await sql(source, "select count(*)::int as n from packs");
    const [b] = await sql(target, "select count(*)::int as n from packs");
    expect(b).toEqual(a);
  });

  it("refuses a file that is not a dump, with one line and a non-zero exit", () => {
    const bogus = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "sagline-backup-")), "bogus.dump");
    fs.writeFileSync(bogus, "not a dump");
    try {
      execFileSync("bash", ["scripts/db-restore.sh", bogus], {
        cwd: root,
        env: { ...process.env, DATABASE_URL: target },
        stdio: "pipe",
      });
      expect.unreachable();
    } catch (err) {
      const stderr = String((err as { stderr?: Buffer }).stderr ?? "");
      expect(stderr.trim().split("\n")).toHaveLength(1);
      expect(stderr).toMatch(/not a dump/);
    }
  });
});
