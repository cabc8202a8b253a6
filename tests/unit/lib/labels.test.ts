// The one label table: every stored code a page or an e-mail can show has words, the words are ours (no
// borrowed state names), and the contributor's words differ where the moderator's would not fit them.
import { describe, expect, it } from "vitest";
import { flagReasons, flagStatuses, loadModes, rejectReasons, resistanceMethods, reviewStatuses } from "@/lib/enums";
import {
  computedResistanceMethodLabel,
  flagOutcomeLabels,
  flagReasonLabels,
  loadModeLabels,
  ownStatusLabels,
  rejectReasonLabels,
  resistanceMethodLabels,
  reviewReasonLabel,
  reviewStatusLabels,
} from "@/lib/labels";

describe("label table", () => {
  it("has words for every code, none of them the code itself", () => {
    const tables: [readonly string[], Record<string, string>][] = [
      [reviewStatuses, reviewStatusLabels],
      [reviewStatuses, ownStatusLabels],
      [rejectReasons, rejectReasonLabels],
      [flagReasons, flagReasonLabels],
      [flagStatuses, flagOutcomeLabels],
      [resistanceMethods, resistanceMethodLabels],
      [loadModes, loadModeLabels],
    ];
    for (const [codes, labels] of tables) {
      for (const code of codes) {
        expect(labels[code], code).toBeTruthy();
        expect(labels[code], code).not.toBe(code);
        expect(labels[code], code).not.toMatch(/_/);
      }
    }
  });

  it("names the state of a result sent back in our own words, for each reader", () => {
    expect(reviewStatusLabels.awaiting_answer).toBe("Waiting for the contributor’s answer");
    expect(ownStatusLabels.awaiting_answer).toBe("Waiting for your answer");
    const all = [...Object.values(reviewStatusLabels), ...Object.values(ownStatusLabels)].join(" ");
    expect(all).not.toMatch(/changes requested/i);
  });

  it("never says a flag outcome corrected a result (moderators cannot edit results)", () => {
    expect(flagOutcomeLabels.corrected).toBe("Kept, with a moderator’s note");
    expect(reviewReasonLabel("flag-corrected")).toBe("Flag resolved: kept, with a moderator’s note");
  });

  it("turns the computed resistance method into words, and an unknown reason or method into neutral words", () => {
    expect(computedResistanceMethodLabel("iec-61960-two-level")).toBe("IEC 61960-3 two-level");
    expect(computedResistanceMethodLabel("step")).toBe("rest → load step at 1 s");
    expect(computedResistanceMethodLabel("something-new")).toBe("another method");
    expect(computedResistanceMethodLabel(null)).toBeNull();
    expect(reviewReasonLabel("wrong-data")).toBe("Wrong data");
    expect(reviewReasonLabel("not-a-known-code")).toBe("Other");
  });
});
