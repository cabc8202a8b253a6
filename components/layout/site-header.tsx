import { Logo } from "./logo";

const nav = [
  { href: "/packs", label: "Packs" },
  { href: "/compare", label: "Compare" },
  { href: "/charts", label: "Charts" },
  { href: "/analyse", label: "Analyse a log" },
  { href: "/methods", label: "Methods" },
  { href: "/data", label: "Data" },
];

export function SiteHeader({ accountSlot }: { accountSlot?: React.ReactNode }) {
  return (
    <header className="border-b border-ink/10 bg-paper-raised/80 backdrop-blur dark:border-night-line dark:bg-night-raised/80">
      <div className="mx-auto flex max-w-page flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <a href="/" className="text-ink no-underline hover:no-underline dark:text-paper" aria-label="Sagline home">
          <Logo />
        </a>
        <nav
          aria-label="Main"
          className="order-3 -mx-1 flex w-full gap-1 overflow-x-auto text-sm sm:order-none sm:w-auto"
        >
          {nav.map((item) => (
            <a
              key={item.href}
              href={item.href}
              className="whitespace-nowrap rounded px-2 py-1 text-ink-soft no-underline hover:bg-paper-sunk hover:text-ink hover:no-underline dark:text-paper/75 dark:hover:bg-night-sunk dark:hover:text-paper"
            >
              {item.label}
            </a>
          ))}
        </nav>
        <div className="ml-auto flex items-center gap-2 text-sm">
          <a
            href="/submit"
            className="rounded-md bg-charge-500 px-3 py-1.5 font-medium text-night no-underline hover:bg-charge-400 hover:no-underline"
          >
            Submit a result
          </a>
          {accountSlot}
        </div>
      </div>
    </header>
  );
}
