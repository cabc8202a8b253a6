// The two ratings of one log, each saying what it is: the sag-limited C ESTIMATE with its assumptions one
// click away ("i"), and the sustained C MEASURED with its rule (or why the run has none), each with the
// label ratio that divides it. Works without JavaScript (<details>).
import type { Figures } from "@/lib/analysis";
import {
  estimateAssumptions,
  LABEL_RATIO_LABELS,
  METHODS_ANCHORS,
  methodsHref,
  RATING_LABELS,
  sustainedReasonWords,
  sustainedRuleWords,
} from "@/lib/figure-words";
import type { FigureU95 } from "@/lib/figure-u95";
import { PlusMinus } from "./plus-minus";

// Figures stored before issue 12 lack everything but the first two fields.
type RatingFiguresInput = Pick<Figures, "sagLimitedC" | "labelRatio"> &
  Partial<
    Pick<
      Figures,
      | "sagLimitedCEstimate"
      | "sagLimitedCAssumptions"
      | "sustainedCRule"
      | "sustainedCMeasured"
      | "sustainedCReason"
      | "sustainedLabelRatio"
    >
  >;

function Info({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <details className="inline-block align-baseline [&[open]]:block">
      <summary
        className="inline-flex h-5 w-5 cursor-pointer list-none items-center justify-center rounded-full border border-ink/30 text-xs font-semibold dark:border-night-line [&::-webkit-details-marker]:hidden"
        aria-label={label}
        title={label}
      >
        i
      </summary>
      <p className="muted mt-1 text-xs">{children}</p>
    </details>
  );
}

const link = "text-inherit underline decoration-dotted underline-offset-2 hover:text-cell-600 dark:hover:text-cell-400";

/** The ± of each rating and ratio, where known (lib/figure-u95.ts). */
type RatingU95 = Partial<Pick<FigureU95, "sagLimitedC" | "labelRatio" | "sustainedCMeasured" | "sustainedLabelRatio">>;

export function RatingFigures({ f, u95 = {} }: { f: RatingFiguresInput; u95?: RatingU95 }) {
  const estimate = f.sagLimitedCEstimate ?? f.sagLimitedC;
  // Results analysed before issue 12 have no rule stored: the measured rating is then simply absent.
  const rule = f.sustainedCRule;
  const reason = sustainedReasonWords(f);
  return (
    <dl className="grid gap-x-6 gap-y-3 text-sm sm:grid-cols-2" data-testid="ratings">
      <div className="border-b border-ink/10 pb-1 dark:border-night-line">
        <dt className="muted">
          <a href={methodsHref(METHODS_ANCHORS.sagLimitedC)} className={link}>
            {RATING_LABELS.estimate}
          </a>
        </dt>
        <dd className="num flex flex-wrap items-baseline gap-2" data-testid="rating-estimate">
          <span>
            <PlusMinus value={estimate} u95={u95.sagLimitedC} digits={1} unit="C" />
          </span>
          {estimate !== null ? (
            <Info label="Assumptions of the sag-limited C estimate">
              An estimate from a resistance, not a tested rate: {estimateAssumptions(f)}.
            </Info>
          ) : null}
        </dd>
        <dd className="muted text-xs">
          {LABEL_RATIO_LABELS.estimate}:{" "}
          <span className="num">
            <PlusMinus value={f.labelRatio} u95={u95.labelRatio} digits={2} />
          </span>
        </dd>
      </div>
      <div className="border-b border-ink/10 pb-1 dark:border-night-line">
        <dt className="muted">
          <a href={methodsHref(METHODS_ANCHORS.sustainedC)} className={link}>
            {RATING_LABELS.measured}
          </a>
        </dt>
        <dd className="num flex flex-wrap items-baseline gap-2" data-testid="rating-measured">
          <span>
            <PlusMinus value={f.sustainedCMeasured ?? null} u95={u95.sustainedCMeasured} digits={1} unit="C" />
          </span>
          {rule ? <Info label="Rule of the measured sustained C">Measured: {sustainedRuleWords(rule)}.</Info> : null}
        </dd>
        {reason ? <dd className="muted text-xs">{reason}</dd> : null}
        {!rule ? <dd className="muted text-xs">Analysed before the measured rating was computed.</dd> : null}
        <dd className="muted text-xs">
          {LABEL_RATIO_LABELS.measured}:{" "}
          <span className="num">
            <PlusMinus value={f.sustainedLabelRatio ?? null} u95={u95.sustainedLabelRatio} digits={2} />
          </span>
        </dd>
      </div>
    </dl>
  );
}
