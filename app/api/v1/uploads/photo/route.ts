// POST /api/v1/uploads/photo — stores one label photo (raw image body), checked by its first bytes and size-limited,
// re-encoded without its metadata (EXIF, GPS, XMP: server/uploads/image.ts); answers with its storage key.
import { AppError } from "@/lib/errors";
import { env } from "@/server/env";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { withPermission } from "@/server/route";
import { incomingPhotoKey, putObject } from "@/server/storage";
import { readLimited } from "@/server/uploads/body";
import { cleanImage, detectImage } from "@/server/uploads/image";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

const NOT_AN_IMAGE = "This file is not a JPEG, PNG or WebP picture.";

export const POST = withPermission("upload.create", async (req, _ctx, user) => {
  if (!user) throw new AppError("unauthenticated", "Please sign in first.");
  const maxBytes = env().PHOTO_MAX_BYTES;
  const type = (req.headers.get("content-type") ?? "").split(";")[0]?.trim().toLowerCase() ?? "";
  if (!type.startsWith("image/"))
    throw new AppError("unsupported_media_type", NOT_AN_IMAGE, { photos: [NOT_AN_IMAGE] });
  await enforceRateLimit(`upload:${user.id}`, limits.uploadPerUser);
  const bytes = await readLimited(
    req,
    maxBytes,
    "photos",
    `The photo is larger than the limit of ${Math.round(maxBytes / (1024 * 1024))} MB.`,
  );
  const image = detectImage(bytes);
  if (!image)
    throw new AppError("validation", NOT_AN_IMAGE, { photos: [`${NOT_AN_IMAGE} Only label photos can be attached.`] });
  const clean = await cleanImage(bytes, image);
  if (!clean)
    throw new AppError("validation", "This picture could not be read.", {
      photos: ["This picture could not be read: it may be damaged. Try another photo."],
    });
  const key = incomingPhotoKey(user.id, image.ext);
  await putObject(key, clean, image.contentType);
  return Response.json(
    { key, bytes: clean.byteLength, contentType: image.contentType },
    { status: 201, headers: { "Cache-Control": "no-store" } },
  );
});
