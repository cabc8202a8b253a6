// POST /api/v1/uploads/photo: label photos, checked by their first bytes, size-limited, and stored re-encoded
// without their metadata (EXIF with GPS and names), turned upright.
import { describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.PHOTO_MAX_BYTES = "4096";
});

import { POST } from "@/app/api/v1/uploads/photo/route";
import { postRequest } from "@/tests/helpers/logs";
import sharp from "sharp";
import { getObjectChunks } from "@/server/storage";
import { EXIF_SECRETS, JPEG_BYTES, JPEG_WITH_EXIF, PNG_BYTES, keysUnder } from "@/tests/helpers/storage";
import { signedIn } from "@/tests/helpers/users";

const call = (req: Request) => POST(req, undefined);
const headers = (token: string | null, type: string) => ({
  "content-type": type,
  ...(token ? { cookie: `authjs.session-token=${token}` } : {}),
});

describe("POST /api/v1/uploads/photo", () => {
  it("needs a session", async () => {
    expect((await call(postRequest("/api/v1/uploads/photo", PNG_BYTES, headers(null, "image/png")))).status).toBe(401);
  });

  it("stores PNG and JPEG pictures under the contributor's incoming prefix, typed by their bytes", async () => {
    const me = await signedIn("contributor");
    const png = await call(postRequest("/api/v1/uploads/photo", PNG_BYTES, headers(me.token, "image/png")));
    expect(png.status).toBe(201);
    const pngBody = await png.json();
    expect(pngBody.key).toMatch(new RegExp(`^incoming/${me.id}/photo-[0-9a-f-]{36}\\.png$`));
    // A JPEG sent as image/png is still stored as what it is.
    const jpeg = await call(postRequest("/api/v1/uploads/photo", JPEG_BYTES, headers(me.token, "image/png")));
    const jpegBody = await jpeg.json();
    expect(jpegBody.key).toMatch(/\.jpg$/);
    expect(jpegBody.contentType).toBe("image/jpeg");
    expect((await keysUnder(`incoming/${me.id}/`)).length).toBe(2);
  });

  it("refuses a file that is not a picture even when it claims to be one (422), and a non-image type (415)", async () => {
    const me = await signedIn("contributor");
    const fake = await call(
      postRequest(
        "/api/v1/uploads/photo",
        new TextEncoder().encode("<svg onload=alert(1)>"),
        headers(me.token, "image/png"),
      ),
    );
    expect(fake.status).toBe(422);
    expect((await fake.json()).error.fieldErrors.photos[0]).toMatch(/not a JPEG, PNG or WebP picture/);
    const pdf = await call(postRequest("/api/v1/uploads/photo", PNG_BYTES, headers(me.token, "application/pdf")));
    expect(pdf.status).toBe(415);
    expect(await keysUnder(`incoming/${me.id}/`)).toEqual([]);
  });

  it("stores a camera photo without its EXIF (no GPS position, no name), turned upright", async () => {
    const me = await signedIn("contributor");
    expect(Buffer.from(JPEG_WITH_EXIF).includes(EXIF_SECRETS.artist)).toBe(true); // the fixture does carry them
    expect((await sharp(JPEG_WITH_EXIF).metadata()).orientation).toBe(6);
    const res = await call(postRequest("/api/v1/uploads/photo", JPEG_WITH_EXIF, headers(me.token, "image/jpeg")));
    expect(res.status).toBe(201);
    const { key } = await res.json();
    const chunks = await getObjectChunks(key);
    if (!chunks) throw new Error("photo not stored");
    const parts: Uint8Array[] = [];
    for await (const c of chunks) parts.push(c);
    const stored = Buffer.concat(parts);
    expect(stored.includes(EXIF_SECRETS.artist)).toBe(false);
    expect(stored.includes(EXIF_SECRETS.gps)).toBe(false);
    expect(stored.includes("Exif")).toBe(false);
    const meta = await sharp(stored).metadata();
    expect(meta).toMatchObject({ format: "jpeg", width: 4, height: 8 }); // 8×4 turned upright by orientation 6
    expect(meta.exif).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
  });

  it("refuses a damaged picture that only starts like one (422)", async () => {
    const me = await signedIn("contributor");
    const damaged = new Uint8Array(600);
    damaged.set(JPEG_BYTES.subarray(0, 40));
    const res = await call(postRequest("/api/v1/uploads/photo", damaged, headers(me.token, "image/jpeg")));
    expect(res.status).toBe(422);
    expect((await res.json()).error.fieldErrors.photos[0]).toMatch(/could not be read/);
    expect(await keysUnder(`incoming/${me.id}/`)).toEqual([]);
  });

  it("refuses a picture over the size limit with 413", async () => {
    const me = await signedIn("contributor");
    const big = new Uint8Array(5000);
    big.set(PNG_BYTES);
    const res = await call(postRequest("/api/v1/uploads/photo", big, headers(me.token, "image/png")));
    expect(res.status).toBe(413);
    expect((await res.json()).error.fieldErrors.photos[0]).toMatch(/larger than the limit/);
  });
});
