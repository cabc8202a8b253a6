/**
 * Bench agreement over published results (issue 16 item 4). Within one like-for-like group, a pack tested by two
 * or more bench profiles is a small inter-laboratory comparison: each bench's value is the median of its results
 * on that pack; ISO 13528:2015 Algorithm A gives the robust consensus x* and s*, and each bench its z (from three
 * benches on) and Eₙ (where the bench states its accuracy, so its U95 rests on no assumption). Each bench's z over
 * all packs and figures make its summary (benchAgreementSummary). Pure: the rows come from db/queries.
 */
import {
  AGREEMENT_FIGURES,
  AGREEMENT_FIGURE_LABELS,
  benchAgreementSummary,
  type AgreementFigure,
  type BenchAgreementSummary,
  type BenchComparison,
} from "@/lib/analysis/agreement/bench-summary";
import {
  agreementFlag,
  scoreParticipants,
  type AgreementFlag,
  type Participant,
} from "@/lib/analysis/agreement/scores";

export type AgreementRow = {
  resultId: number;
  benchId: number;
  packId: number;
  groupKey: string;
  values: Partial<Record<AgreementFigure, number | null>>;
  /** Each figure's U95 when the bench states its accuracy in full; absent otherwise (no Eₙ then). */
  u95?: Partial<Record<AgreementFigure, number | null>>;
};

export type BenchScore = {
  groupKey: string;
  packId: number;
  figure: AgreementFigure;
  benchValue: number;
  consensus: number;
  benches: number;
  z: number | null;
  en: number | null;
};

export type BenchAgreement = { summary: BenchAgreementSummary; scores: BenchScore[] };

function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const mid = (s.length - 1) / 2;
  return ((s[Math.floor(mid)] as number) + (s[Math.ceil(mid)] as number)) / 2;
}

const finite = (x: number | null | undefined): x is number => typeof x === "number" && Number.isFinite(x);

/** Each bench's value (the median of its results) for one pack, group and figure. */
function participantsOf(rows: readonly AgreementRow[], figure: AgreementFigure): Participant[] {
  const byBench = new Map<number, { values: number[]; u: number[]; stated: boolean }>();
  for (const r of rows) {
    const v = r.values[figure];
    if (!finite(v)) continue;
    const entry = byBench.get(r.benchId) ?? { values: [], u: [], stated: true };
    entry.values.push(v);
    const u = r.u95?.[figure];
    if (finite(u)) entry.u.push(u);
    else entry.stated = false;
    byBench.set(r.benchId, entry);
  }
  return [...byBench.entries()].map(([benchId, e]) => ({
    benchId: String(benchId),
    value: median(e.values),
    U95: e.stated && e.u.length > 0 ? median(e.u) : null,
  }));
}

function cells(rows: readonly AgreementRow[]): Map<string, AgreementRow[]> {
  const out = new Map<string, AgreementRow[]>();
  for (const r of rows) {
    const key = `${r.groupKey}\u0000${r.packId}`;
    const list = out.get(key) ?? [];
    list.push(r);
    out.set(key, list);
  }
  return out;
}

/** Every bench's scores and summary; benches with no pack shared with another bench get an empty summary. */
export function benchAgreements(rows: readonly AgreementRow[]): Map<number, BenchAgreement> {
  const scores = new Map<number, BenchScore[]>();
  for (const r of rows) if (!scores.has(r.benchId)) scores.set(r.benchId, []);
  for (const cell of cells(rows).values()) {
    const first = cell[0];
    if (!first) continue;
    for (const figure of AGREEMENT_FIGURES) {
      const participants = participantsOf(cell, figure);
      if (participants.length < 2) continue;
      const scored = scoreParticipants(participants);
      if (!scored.consensus) continue;
      for (const s of scored.scores) {
        scores.get(Number(s.benchId))?.push({
          groupKey: first.groupKey,
          packId: first.packId,
          figure,
          benchValue: s.value,
          consensus: scored.consensus.x,
          benches: participants.length,
          z: s.z,
          en: s.en,
        });
      }
    }
  }
  const out = new Map<number, BenchAgreement>();
  for (const [benchId, list] of scores) {
    const comparisons: BenchComparison[] = list.map((s) => ({
      figure: s.figure,
      packId: `${s.groupKey}\u0000${s.packId}`,
      z: s.z,
    }));
    out.set(benchId, { summary: benchAgreementSummary(comparisons), scores: list });
  }
  return out;
}

export type NewResultAgreement = {
  figure: AgreementFigure;
  z: number | null;
  benches: number;
  flag: AgreementFlag | null;
};

/**
 * A new result against the published benches on its pack and group: the candidate stands in for its bench (its own
 * published results there are left out), then Algorithm A and z as above. A flag where |z| > 3.
 */
export function scoreNewResult(published: readonly AgreementRow[], candidate: AgreementRow): NewResultAgreement[] {
  const others = published.filter(
    (r) =>
      r.groupKey === candidate.groupKey &&
      r.packId === candidate.packId &&
      r.benchId !== candidate.benchId &&
      r.resultId !== candidate.resultId,
  );
  const out: NewResultAgreement[] = [];
  for (const figure of AGREEMENT_FIGURES) {
    const v = candidate.values[figure];
    if (!finite(v)) continue;
    const participants = [...participantsOf(others, figure), { benchId: String(candidate.benchId), value: v }];
    if (participants.length < 2) continue;
    const scored = scoreParticipants(participants);
    const own = scored.scores.find((s) => s.benchId === String(candidate.benchId));
    const z = own?.z ?? null;
    out.push({ figure, z, benches: participants.length, flag: agreementFlag(z, AGREEMENT_FIGURE_LABELS[figure]) });
  }
  return out;
}
