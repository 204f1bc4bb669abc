// @ts-nocheck
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { HeaderBar } from "@/components/ui/header-bar";
import { FullscreenButton } from "@/components/lessons/fullscreen-button";
import { ThemeSwitch } from "@/components/theme-switch";

/** The classroom: no app navigation, large type, made to be read from the back of a room. */
export default async function ClassroomLayout({ children }: { children: React.ReactNode }) {
  await requirePageUser();
  return (
    <div className="flex min-h-screen flex-col text-lg">
      <HeaderBar className="border-b border-line bg-panel" innerClassName="flex flex-wrap items-center gap-4 px-6 py-2 text-sm" logoHref="/lessons" logoLabel="Back to lessons">
        <Link href="/lessons" className="hover:underline">
          ← Lessons
        </Link>
        <div className="ml-auto flex items-center gap-3">
          <ThemeSwitch />
          <FullscreenButton />
        </div>
      </HeaderBar>
      <main id="main" className="w-full flex-1 px-6 py-6">
        {children}
      </main>
    </div>
  );
}
