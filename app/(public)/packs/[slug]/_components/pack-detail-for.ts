// The pack a /packs/[slug]/… page is about: its slug checked (anything else is a 404, never an error) and its
// detail read through the tagged cache. Shared by the pack page and its full figures table, and by their metadata.
import { z } from "zod";
import { cachedPackDetail } from "@/server/public-data";

const params = z.object({ slug: z.string().regex(/^[a-z0-9-]{1,120}$/) });
export type PackPageProps = { params: Promise<{ slug: string }> };

/** The pack's detail, or null when the slug is malformed or names no published pack. */
export async function packDetailFor(props: PackPageProps) {
  const parsed = params.safeParse(await props.params);
  return parsed.success ? cachedPackDetail(parsed.data.slug) : null;
}
