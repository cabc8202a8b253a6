"use client";
// A client component although it has no state: the header is the same on every page, and as a client component
// it travels in each page's React payload as a reference, not as its markup a second time (≈ 2 KB a page).
import { UnitsControl, UnitsControlAfterLoad } from "@/components/units/units-control-client";
import { Logo } from "./logo";

const nav = [
  { href: "/packs", label: "Packs" },
  { href: "/compare", label: "Compare" },
  { href: "/charts", label: "Charts" },
  { href: "/analyse", label: "Analyse a log" },
  { href: "/methods", label: "Methods" },
  { href: "/data", label: "Data" },
];

// Wide screens show the links in a row; below 768 px they fold into a menu that lists every one of them
// (a <details>, so it opens without a script). The reader's units sit beside them.
export function SiteHeader({ accountSlot }: { accountSlot?: React.ReactNode }) {
  return (
    <header className="border-b border-ink/10 bg-paper-raised/80 backdrop-blur dark:border-night-line dark:bg-night-raised/80">
      <div className="mx-auto flex max-w-page items-center gap-x-4 gap-y-2 px-4 py-3">
        <a href="/" className="text-ink no-underline hover:no-underline dark:text-paper" aria-label="Sagline home">
          <Logo />
        </a>
        <nav aria-label="Main" className="hidden gap-1 text-sm md:flex">
          {nav.map((item) => (
            <a key={item.href} href={item.href} className="nav-link">
              {item.label}
            </a>
          ))}
        </nav>
        <div className="ml-auto flex items-center gap-2 text-sm">
          <div className="hidden md:block">
            <UnitsControl convert />
          </div>
          <a href="/submit" className="btn-charge whitespace-nowrap">
            Submit<span className="hidden sm:inline"> a result</span>
          </a>
          {accountSlot}
          <details className="menu md:hidden" data-testid="site-menu">
            <summary className="btn-sm">Menu</summary>
            <div className="menu-panel w-60 space-y-3">
              <nav aria-label="Main menu">
                <ul className="space-y-1">
                  {nav.map((item) => (
                    <li key={item.href}>
                      <a href={item.href} className="nav-link block">
                        {item.label}
                      </a>
                    </li>
                  ))}
                </ul>
              </nav>
              <UnitsControlAfterLoad />
            </div>
          </details>
        </div>
      </div>
    </header>
  );
}
