// @ts-nocheck
import type { Metadata } from "next";
import { requirePageUser } from "@/app/_lib/session";
import { JoinForm } from "./join-form";

export const metadata: Metadata = { title: "Join a lesson" };

export default async function JoinPage({ searchParams }: { searchParams: Promise<{ code?: string }> }) {
  await requirePageUser();
  const { code } = await searchParams;
  return (
    <div className="max-w-md">
      <h1 className="mb-2 text-2xl font-semibold">Join a lesson</h1>
      <p className="mb-4 text-sm text-muted">Type the class code your instructor shows. You will see the lesson read-only, and you can copy its combinations into your own.</p>
      <JoinForm initialCode={typeof code === "string" ? code.slice(0, 12) : ""} />
    </div>
  );
}
