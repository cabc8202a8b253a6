"use client";
// A client component although it has no state, for the reason given in site-header.tsx.
import { ATTRIBUTION, DATA_LICENCE_LABEL, DATA_LICENCE_URL } from "@/lib/open-data/licence";

export function SiteFooter() {
  return (
    <footer className="mt-16 border-t border-ink/10 py-8 text-sm dark:border-night-line">
      <div className="mx-auto grid max-w-page gap-4 px-4 sm:grid-cols-[2fr_1fr]">
        <div className="space-y-2">
          <p>
            Data on Sagline is published under{" "}
            <a href={DATA_LICENCE_URL} rel="license">
              {DATA_LICENCE_LABEL}
            </a>{" "}
            — credit “{ATTRIBUTION}”. The code is MIT-licensed (see LICENSE).
          </p>
          <p className="muted">
            Sagline reports measurements; it does not certify packs. Charging and high-current use of lithium packs can
            start fires: follow the maker’s instructions, never charge unattended, and retire swollen packs.{" "}
            <a href="/methods#safety">Safety notes</a>.
          </p>
        </div>
        <nav aria-label="Footer" className="flex flex-wrap gap-x-4 gap-y-1 sm:justify-end">
          <a href="/methods">Methods</a>
          <a href="/data">Open data &amp; API</a>
          <a href="/charts">Charts</a>
          <a href="/account">Account</a>
        </nav>
      </div>
    </footer>
  );
}
