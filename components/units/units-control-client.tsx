"use client";
// The reader's units: one control (°C/°F, g/oz, per cell/per pack), kept in the URL and remembered in this
// browser. Mounted in the header; it also converts the page (and whatever arrives later) as it changes.
import { useEffect, useId, useSyncExternalStore } from "react";
import { type UnitPrefs } from "@/lib/units";
import { applyUnits } from "./apply-units";
import { rememberUrlUnits, setUnits, useUnits } from "./units-store";

const CHOICES: { key: keyof UnitPrefs; legend: string; options: { value: string; label: string }[] }[] = [
  {
    key: "temperature",
    legend: "Temperature",
    options: [
      { value: "C", label: "°C" },
      { value: "F", label: "°F" },
    ],
  },
  {
    key: "mass",
    legend: "Weight",
    options: [
      { value: "g", label: "g" },
      { value: "oz", label: "oz" },
    ],
  },
  {
    key: "basis",
    legend: "Voltage and resistance",
    options: [
      { value: "cell", label: "per cell" },
      { value: "pack", label: "per pack" },
    ],
  },
];

/** Converts the page now and whenever markup arrives (client renders, the home page's group switcher). */
function useConvertPage(prefs: UnitPrefs) {
  useEffect(() => {
    applyUnits(document, prefs);
    const observer = new MutationObserver((records) => {
      if (records.some((r) => r.addedNodes.length > 0)) applyUnits(document, prefs);
    });
    observer.observe(document.body, { childList: true, subtree: true });
    return () => observer.disconnect();
  }, [prefs]);
}

export function UnitsControl({ convert = false }: { convert?: boolean }) {
  const prefs = useUnits();
  const id = useId();
  useEffect(rememberUrlUnits, []);
  return (
    <>
      {convert ? <ConvertPage prefs={prefs} /> : null}
      <details className="menu" data-testid="units-control">
        <summary className="btn-sm">
          Units<span className="sr-only">: </span>
          <span className="muted text-xs">
            {" "}
            {prefs.temperature === "F" ? "°F" : "°C"} · {prefs.mass} · {prefs.basis === "pack" ? "pack" : "cell"}
          </span>
        </summary>
        <div className="menu-panel space-y-2">
          {CHOICES.map((c) => (
            <fieldset key={c.key} className="space-y-1">
              <legend className="text-xs font-medium">{c.legend}</legend>
              <div className="flex gap-3">
                {c.options.map((o) => (
                  <label key={o.value} className="flex items-center gap-1 text-sm">
                    <input
                      type="radio"
                      name={`${id}-${c.key}`}
                      value={o.value}
                      checked={prefs[c.key] === o.value}
                      onChange={() => setUnits({ ...prefs, [c.key]: o.value })}
                    />
                    {o.label}
                  </label>
                ))}
              </div>
            </fieldset>
          ))}
          <p className="muted text-xs">
            Kept in the address and in this browser. The API and downloads stay SI unless asked.
          </p>
        </div>
      </details>
    </>
  );
}

function ConvertPage({ prefs }: { prefs: UnitPrefs }) {
  useConvertPage(prefs);
  return null;
}

/**
 * The same control for the phone menu, drawn only once the page's script runs: the header already carries one
 * for wide screens, and units convert only with the script, so the HTML does not carry a second copy
 * (≈ 2 KB on every page). It sits in the closed menu, so appearing later shifts nothing.
 */
const noSubscription = () => () => {};

export function UnitsControlAfterLoad() {
  // False on the server and while hydrating, true from then on (nothing to subscribe to).
  const ready = useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
  return ready ? <UnitsControl /> : null;
}
