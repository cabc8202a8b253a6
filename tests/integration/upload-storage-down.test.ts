// When file storage is down the contributor is told so plainly (503), and nothing is half-stored.
import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.S3_ENDPOINT = "http://127.0.0.1:9"; // nothing listens on the discard port here
});

import { POST as uploadLog } from "@/app/api/v1/uploads/log/route";
import { db } from "@/db";
import { results } from "@/db/schema";
import { requestState } from "@/tests/helpers/next-mocks";
import { makePack, submission } from "@/tests/helpers/submission";
import { POST as uploadPhoto } from "@/app/api/v1/uploads/photo/route";
import { postRequest, sampleLog } from "@/tests/helpers/logs";
import { PNG_BYTES } from "@/tests/helpers/storage";
import { signedIn } from "@/tests/helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");

describe("uploads while storage is unreachable", () => {
  it("answers 503 with a plain message for a log and for a photo", async () => {
    const me = await signedIn("contributor");
    const cookie = `authjs.session-token=${me.token}`;
    const log = await uploadLog(
      postRequest("/api/v1/uploads/log?filename=a.csv", sampleLog().csv, { "content-type": "text/csv", cookie }),
      undefined,
    );
    expect(log.status).toBe(503);
    expect((await log.json()).error.message).toMatch(/File storage is not reachable right now/);
    const photo = await uploadPhoto(
      postRequest("/api/v1/uploads/photo", PNG_BYTES, { "content-type": "image/png", cookie }),
      undefined,
    );
    expect(photo.status).toBe(503);
  });

  it("tells the contributor at submit time, and stores no result", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const { packId } = await makePack();
    const res = await submitResult(
      null,
      submission(packId, { key: `incoming/${me.id}/00000000-0000-4000-8000-000000000000.csv`, filename: "a.csv" }),
    );
    expect(res).toMatchObject({ ok: false, code: "unavailable" });
    expect(res.error).toMatch(/File storage is not reachable/);
    expect(await db.$count(results, eq(results.contributorId, me.id))).toBe(0);
  });
});
