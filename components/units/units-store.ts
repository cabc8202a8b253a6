// The reader's units in the browser: the URL's `units` parameter wins (and is remembered), else what was
// remembered in localStorage, else the defaults. Public pages stay static: they are rendered in the defaults
// and converted here (apply-units.ts). Client components follow with useUnits().
import { useSyncExternalStore } from "react";
import { DEFAULT_UNITS, parseUnitsParam, writeUnitsParam, type UnitPrefs } from "@/lib/units";

const KEY = "sagline-units";
const EVENT = "sagline:units";

function remembered(): string {
  try {
    return window.localStorage.getItem(KEY) ?? "";
  } catch {
    return "";
  }
}

/** The units parameter in force on this page ("" for the defaults). */
function currentUnitsParam(): string {
  const fromUrl = new URLSearchParams(window.location.search).get("units");
  return writeUnitsParam(parseUnitsParam(fromUrl ?? remembered()));
}

/** Remember the units, put them in the URL (replacing the entry) and tell the page. */
export function setUnits(prefs: UnitPrefs): void {
  const param = writeUnitsParam(prefs);
  try {
    if (param) window.localStorage.setItem(KEY, param);
    else window.localStorage.removeItem(KEY);
  } catch {
    // Private windows may refuse storage: the URL still carries the choice.
  }
  const url = new URL(window.location.href);
  if (param) url.searchParams.set("units", param);
  else url.searchParams.delete("units");
  window.history.replaceState(window.history.state, "", url);
  window.dispatchEvent(new Event(EVENT));
}

/** A URL that came with units is remembered, so the next page keeps them. */
export function rememberUrlUnits(): void {
  const fromUrl = new URLSearchParams(window.location.search).get("units");
  if (fromUrl === null) return;
  try {
    const param = writeUnitsParam(parseUnitsParam(fromUrl));
    if (param) window.localStorage.setItem(KEY, param);
    else window.localStorage.removeItem(KEY);
  } catch {
    // as above
  }
}

function subscribe(onChange: () => void) {
  window.addEventListener(EVENT, onChange);
  window.addEventListener("popstate", onChange);
  window.addEventListener("storage", onChange);
  return () => {
    window.removeEventListener(EVENT, onChange);
    window.removeEventListener("popstate", onChange);
    window.removeEventListener("storage", onChange);
  };
}

/** The reader's units; the defaults while rendering on the server and hydrating. */
export function useUnits(): UnitPrefs {
  const param = useSyncExternalStore(subscribe, currentUnitsParam, () => "");
  return param ? parseUnitsParam(param) : DEFAULT_UNITS;
}
