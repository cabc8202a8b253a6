import { SiteFooter } from "@/components/layout/site-footer";
import { SiteHeader } from "@/components/layout/site-header";

export default function PublicLayout({ children }: { children: React.ReactNode }) {
  return (
    <>
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-paper-raised focus:p-2">
        Skip to content
      </a>
      <SiteHeader />
      <main id="main" className="mx-auto max-w-page px-4 py-8">
        {children}
      </main>
      <SiteFooter />
    </>
  );
}
