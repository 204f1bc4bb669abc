// @ts-nocheck
import Link from "next/link";
import { getCurrentUser } from "@/app/_lib/session";

export default async function HomePage() {
  const user = await getCurrentUser().catch(() => null);
  return (
    <div className="flex flex-col gap-10">
      <section className="flex flex-col gap-4">
        <h1 className="text-3xl font-semibold tracking-tight">Choose the blower pulley before you buy it.</h1>
        <p className="max-w-2xl text-lg text-muted">
          A Roots or twin-screw blower&apos;s boost is not a setting: it is what the blower pushes against what the
          engine swallows. Pulleywright predicts boost, blower speed, charge temperature, drive power and fuel from the
          engine, the blower and the two pulleys, finds the pulley for a target boost, and shows what a change of
          cam, intercooler, altitude or pulley does before any part is ordered.
        </p>
        <div className="flex gap-3">
          {user ? (
            <Link href="/combinations" className="rounded-md bg-accent px-4 py-2 font-medium text-accent-fg">
              Open your combinations
            </Link>
          ) : (
            <>
              <Link href="/sign-in" className="rounded-md bg-accent px-4 py-2 font-medium text-accent-fg">
                Sign in
              </Link>
              <Link href="/sign-up" className="rounded-md border border-line bg-panel px-4 py-2 font-medium">
                Create a free member account
              </Link>
            </>
          )}
        </div>
      </section>
      <section aria-labelledby="what" className="grid gap-4 sm:grid-cols-3">
        <h2 id="what" className="sr-only">
          What it does
        </h2>
        {[
          ["Planner", "Edit a combination and watch boost, power and torque against engine speed redraw as you go."],
          ["Pulley ladder and finder", "Every candidate blower pulley with boost, blower speed against its limit, charge temperature and warnings; or the exact size for a target boost."],
          ["Side by side", "Two combinations or two revisions on one chart, with the difference at the speeds you pick and the reason boost moved."],
          ["Datalogs", "Upload measured boost, compare it with the prediction and calibrate the engine's real volumetric efficiency."],
          ["Recommendation sheet", "Turn a customer's engine into a printed or e-mailed recommendation with parts, prices and cautions."],
          ["Lessons", "An instructor's ordered comparisons for the classroom, with a what-if slider."],
        ].map(([title, text]) => (
          <div key={title} className="rounded-lg border border-line bg-panel p-4">
            <h3 className="font-semibold">{title}</h3>
            <p className="mt-1 text-sm text-muted">{text}</p>
          </div>
        ))}
      </section>
    </div>
  );
}
