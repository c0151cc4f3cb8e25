import { Wordmark } from "@/components/shell/logo";

/** Pages customers open from an e-mail, without an account: no member navigation. */
export default function PublicLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="min-h-screen">
      <header className="border-b border-rule bg-panel">
        <div className="mx-auto flex max-w-3xl items-center px-4 py-4">
          <Wordmark />
        </div>
      </header>
      <main id="main" className="mx-auto max-w-3xl px-4 py-8">
        {children}
      </main>
    </div>
  );
}
