// The page frame every audience shares: skip link, header (with the account menu), main, footer.
import { ChartBehaviour } from "@/components/charts/chart-behaviour-client";
import { AccountMenu } from "./account-menu-client";
import { SiteFooter } from "./site-footer";
import { SiteHeader } from "./site-header";
import { SiteNotice } from "./site-notice";

export function SiteShell({ children }: { children: React.ReactNode }) {
  return (
    <>
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-paper-raised focus:p-2"
      >
        Skip to content
      </a>
      <SiteHeader accountSlot={<AccountMenu />} />
      <SiteNotice />
      <main id="main" className="mx-auto max-w-page px-4 py-8">
        {children}
      </main>
      <SiteFooter />
      <ChartBehaviour />
    </>
  );
}
