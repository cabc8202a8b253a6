"use client";
// The home page's group switcher: it fetches the chosen group's label check (server-drawn markup, from
// /fragments/label-check/{group}) and swaps it in, so the page carries one group's figures, not all of them.
import { useState } from "react";

type Group = { key: string; label: string; packCount: number };

export function GroupSwitcher({ groups, target }: { groups: Group[]; target: string }) {
  const [key, setKey] = useState(groups[0]?.key ?? "");
  const [error, setError] = useState<string | null>(null);
  const change = async (next: string) => {
    setKey(next);
    const box = document.getElementById(target);
    box?.setAttribute("aria-busy", "true");
    try {
      const res = await fetch(`/fragments/label-check/${encodeURIComponent(next)}`);
      if (!res.ok) throw new Error(String(res.status));
      if (box) box.innerHTML = await res.text();
      setError(null);
    } catch {
      setError("That group could not be loaded. Try again.");
    } finally {
      box?.removeAttribute("aria-busy");
    }
  };
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm">
      <label htmlFor="group-switcher" className="font-medium">
        Like-for-like group
      </label>
      <select
        id="group-switcher"
        value={key}
        onChange={(e) => void change(e.target.value)}
        data-testid="group-switcher"
        className="input max-w-full"
      >
        {groups.map((g) => (
          <option key={g.key} value={g.key}>
            {g.label} — {g.packCount} packs
          </option>
        ))}
      </select>
      {error ? (
        <p role="alert" className="text-warn">
          {error}
        </p>
      ) : null}
    </div>
  );
}
