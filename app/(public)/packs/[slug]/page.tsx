import { notFound } from "next/navigation";
import { z } from "zod";
import { getPackBySlug } from "@/db/queries/packs";
import { fmt, labelSpec, packTitle } from "@/lib/format";

export const revalidate = 300;
export async function generateStaticParams() {
  return [];
}

const params = z.object({ slug: z.string().regex(/^[a-z0-9-]{1,120}$/) });

export default async function PackPage(props: { params: Promise<{ slug: string }> }) {
  const parsed = params.safeParse(await props.params);
  if (!parsed.success) notFound();
  const pack = await getPackBySlug(parsed.data.slug);
  if (!pack) notFound();
  return (
    <article className="space-y-4">
      <h1>{packTitle(pack)}</h1>
      <p className="num muted">{labelSpec(pack)} · {fmt(pack.weightG, 0, "g")} · {pack.connector}</p>
    </article>
  );
}
