import { QueryProvider } from "@/components/providers/query-provider";
import { SiteHeader } from "@/components/shell/site-header";

export default function AppLayout({ children }: { children: React.ReactNode }) {
  return (
    <>
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-4 focus:top-4 focus:z-50 focus:rounded-chip focus:bg-glow focus:px-4 focus:py-2 focus:text-glow-ink"
      >
        Skip to content
      </a>
      <SiteHeader />
      <main id="main" className="mx-auto max-w-6xl px-4 py-8">
        <QueryProvider>{children}</QueryProvider>
      </main>
    </>
  );
}
