// @ts-nocheck
import Link from "next/link";
import { HeaderBar } from "@/components/ui/header-bar";
import { ThemeSwitch } from "@/components/theme-switch";

export default function PublicLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col">
      <HeaderBar className="no-print border-b border-line bg-panel" innerClassName="mx-auto flex max-w-5xl flex-wrap items-center justify-between gap-2 px-4 py-3" logoHref="/" logoLabel="Pulleywright home">
        <nav aria-label="Account" className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
          <ThemeSwitch />
          <Link href="/sign-in" className="hover:underline">
            Sign in
          </Link>
          <Link href="/sign-up" className="rounded-md bg-accent px-3 py-1.5 font-medium text-accent-fg">
            Create an account
          </Link>
        </nav>
      </HeaderBar>
      <main id="main" className="mx-auto w-full max-w-5xl flex-1 px-4 py-10">
        {children}
      </main>
      <footer className="no-print border-t border-line py-4 text-center text-xs text-muted">
        Predictions are estimates. Confirm on a dyno with wideband air-fuel and knock monitoring.
      </footer>
    </div>
  );
}
