// When file storage is down the contributor is told so plainly (503), and nothing is half-stored.
import { describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.S3_ENDPOINT = "http://127.0.0.1:9"; // nothing listens on the discard port here
});

import { POST as uploadLog } from "@/app/api/v1/uploads/log/route";
import { POST as uploadPhoto } from "@/app/api/v1/uploads/photo/route";
import { postRequest, sampleLog } from "@/tests/helpers/logs";
import { PNG_BYTES } from "@/tests/helpers/storage";
import { signedIn } from "@/tests/helpers/users";

describe("uploads while storage is unreachable", () => {
  it("answers 503 with a plain message for a log and for a photo", async () => {
    const me = await signedIn("contributor");
    const cookie = `authjs.session-token=${me.token}`;
    const log = await uploadLog(postRequest("/api/v1/uploads/log?filename=a.csv", sampleLog().csv, { "content-type": "text/csv", cookie }), undefined);
    expect(log.status).toBe(503);
    expect((await log.json()).error.message).toMatch(/File storage is not reachable right now/);
    const photo = await uploadPhoto(postRequest("/api/v1/uploads/photo", PNG_BYTES, { "content-type": "image/png", cookie }), undefined);
    expect(photo.status).toBe(503);
  });
});
