"use client";
// The home page's group switcher and rating switch: it fetches the chosen group's label check for the chosen
// rating (server-drawn markup, from /fragments/label-check/{group}/{rating}) and swaps it in, so the page
// carries one group's figures in one rating, not all of them. The estimate comes first: inside one like-for-like
// group (one band of load rates) the measured rating mostly restates the rate the group was tested at, which the
// chart's notes say when it is shown.
import { useState } from "react";
import { RATING_LABELS, type RatingKind } from "@/lib/figure-words";

type Group = { key: string; label: string; packCount: number };

const RATING_ORDER: RatingKind[] = ["estimate", "measured"];

export function GroupSwitcher({ groups, target }: { groups: Group[]; target: string }) {
  const [key, setKey] = useState(groups[0]?.key ?? "");
  const [rating, setRating] = useState<RatingKind>("estimate");
  const [error, setError] = useState<string | null>(null);
  const show = async (nextKey: string, nextRating: RatingKind) => {
    setKey(nextKey);
    setRating(nextRating);
    const box = document.getElementById(target);
    box?.setAttribute("aria-busy", "true");
    try {
      const res = await fetch(`/fragments/label-check/${encodeURIComponent(nextKey)}/${nextRating}`);
      if (!res.ok) throw new Error(String(res.status));
      if (box) box.innerHTML = await res.text();
      setError(null);
    } catch {
      setError("That chart could not be loaded. Try again.");
    } finally {
      box?.removeAttribute("aria-busy");
    }
  };
  return (
    <div className="space-y-2 text-sm">
      <div className="flex max-w-full flex-wrap items-center gap-2">
        <label htmlFor="group-switcher" className="font-medium">
          Like-for-like group
        </label>
        <select
          id="group-switcher"
          value={key}
          onChange={(e) => void show(e.target.value, rating)}
          data-testid="group-switcher"
          className="input max-w-full"
        >
          {groups.map((g) => (
            <option key={g.key} value={g.key}>
              {g.label} — {g.packCount} packs
            </option>
          ))}
        </select>
      </div>
      <fieldset className="flex flex-wrap items-center gap-3" data-testid="rating-switch">
        <legend className="sr-only">Rating on the vertical axis</legend>
        <span className="font-medium" aria-hidden="true">
          Rating
        </span>
        {RATING_ORDER.map((r) => (
          <label key={r} className="flex items-center gap-1">
            <input
              type="radio"
              name="home-rating"
              value={r}
              checked={rating === r}
              onChange={() => void show(key, r)}
            />
            {RATING_LABELS[r]}
          </label>
        ))}
      </fieldset>
      {error ? (
        <p role="alert" className="text-warn">
          {error}
        </p>
      ) : null}
    </div>
  );
}
