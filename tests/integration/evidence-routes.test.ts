// A result's evidence through its permission-checked routes: label photos at /results/<id>/photos/<n>
// (moderators always, the contributor their own, everyone else only once the result is published — 404
// otherwise, revealing nothing) and the raw log at /review/<id>/log (moderators only, as uploaded).
import { beforeAll, describe, expect, it, vi } from "vitest";
import sharp from "sharp";
import { GET as photoRoute } from "@/app/(public)/results/[id]/photos/[n]/route";
import { GET as logRoute } from "@/app/(review)/review/[id]/log/route";
import { decideResult } from "@/server/review";
import { sampleLog } from "../helpers/logs";
import { requestState } from "../helpers/next-mocks";
import { makePack, submission, uploadLog, uploadPhoto } from "../helpers/submission";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);
vi.mock("@/server/revalidate", () => ({ revalidateTags: vi.fn() }));
const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");

const get = (path: string, token: string | null) =>
  new Request(`http://localhost:3011${path}`, { headers: token ? { cookie: `authjs.session-token=${token}` } : {} });
const photo = (id: number, n: number, token: string | null) =>
  photoRoute(get(`/results/${id}/photos/${n}`, token), { params: Promise.resolve({ id: String(id), n: String(n) }) });
const log = (id: number, token: string | null) =>
  logRoute(get(`/review/${id}/log`, token), { params: Promise.resolve({ id: String(id) }) });

let resultId = 0;
let csv = "";
const who = {} as Record<"contributor" | "other" | "moderator", { id: string; token: string }>;

beforeAll(async () => {
  who.contributor = await signedIn("contributor", "evidence");
  who.other = await signedIn("contributor", "stranger");
  who.moderator = await signedIn("moderator", "evidence-mod");
  const { packId } = await makePack();
  csv = sampleLog({ seed: 5 }).csv;
  requestState.token = who.contributor.token;
  const logRef = await uploadLog(who.contributor.token, csv, "evidence.csv");
  const photos = [await uploadPhoto(who.contributor.token), await uploadPhoto(who.contributor.token)];
  const res = await submitResult(null, submission(packId, logRef, { photoKeys: photos }));
  if (!res.ok) throw new Error(`submit failed: ${res.error}`);
  resultId = res.data.resultId;
});

describe("label photos", () => {
  it("before publication: the contributor and moderators see them; others and the public get 404", async () => {
    const own = await photo(resultId, 1, who.contributor.token);
    expect(own.status).toBe(200);
    expect(own.headers.get("content-type")).toBe("image/png");
    expect(own.headers.get("cache-control")).toBe("private, no-store");
    expect((await sharp(Buffer.from(await own.arrayBuffer())).metadata()).format).toBe("png");
    expect((await photo(resultId, 2, who.moderator.token)).status).toBe(200);
    expect((await photo(resultId, 1, who.other.token)).status).toBe(404);
    expect((await photo(resultId, 1, null)).status).toBe(404);
    // Only the photos it has, numbered from 1.
    expect((await photo(resultId, 3, who.moderator.token)).status).toBe(404);
    expect(
      (
        await photoRoute(get(`/results/${resultId}/photos/0`, null), {
          params: Promise.resolve({ id: String(resultId), n: "0" }),
        })
      ).status,
    ).toBe(404);
  });

  it("once approved, anyone sees them (cacheable for a few minutes)", async () => {
    await decideResult(who.moderator.id, resultId, {
      kind: "approve",
      note: null,
      catalogue: { intoPackId: null, intoMakerId: null },
    });
    const res = await photo(resultId, 1, null);
    expect(res.status).toBe(200);
    expect(res.headers.get("cache-control")).toBe("public, max-age=300");
    expect((await photo(resultId, 2, who.other.token)).status).toBe(200);
  });
});

describe("the raw log", () => {
  it("is a download for moderators, byte for byte as uploaded", async () => {
    const res = await log(resultId, who.moderator.token);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="result-${resultId}-evidence.csv"`);
    expect(res.headers.get("cache-control")).toBe("private, no-store");
    expect(await res.text()).toBe(csv);
  });

  it("is not for contributors (not even their own: 403) or the public (401)", async () => {
    expect((await log(resultId, who.contributor.token)).status).toBe(403);
    expect((await log(resultId, null)).status).toBe(401);
    expect((await log(999_999_999, who.moderator.token)).status).toBe(404);
  });
});
