// @ts-nocheck
// The database stops under the running app: requests get a clear 503 (not a crash, not a hang),
// the app recovers by itself when the database returns, and no acknowledged save is lost.
import { afterAll, describe, expect, it } from "vitest";
import { exampleCombination } from "@/calc";
import { controlCluster } from "@/scripts/cluster";
import { signedIn } from "../support/http";

const dir = process.env.PW_PG_DIR!;

describe("database outage", () => {
  let stopped = false;
  afterAll(() => {
    if (stopped) controlCluster(dir, "start");
  });

  it("answers 503 while the database is down, recovers after, and keeps acknowledged saves", async () => {
    const tuner = await signedIn("tuner@example.com");
    const name = `outage-${Date.now()}`;
    const created = await tuner.json("/api/combinations", "POST", { name, spec: exampleCombination() });
    expect(created.status).toBe(201);
    const id = created.data.id ?? created.data.combination?.id;
    expect(id).toBeTruthy();

    controlCluster(dir, "stop");
    stopped = true;

    const started = Date.now();
    const down = await tuner.json(`/api/combinations/${id}`);
    // A clear answer, quickly: the pool gives up connecting after a few seconds.
    expect(down.status).toBe(503);
    expect(String(down.data.error)).toMatch(/database/i);
    expect(Date.now() - started).toBeLessThan(15_000);
    const write = await tuner.json("/api/combinations", "POST", { name: name + "-lost", spec: exampleCombination() });
    expect(write.status).toBe(503);
    // The process is still up.
    expect((await tuner.fetch("/api/health")).status).toBe(200);

    controlCluster(dir, "start");
    stopped = false;

    // Recovers by itself: no restart of the app.
    let back = 0;
    for (let i = 0; i < 60 && back !== 200; i++) {
      back = (await tuner.json(`/api/combinations/${id}`)).status;
      if (back !== 200) await new Promise((r) => setTimeout(r, 500));
    }
    expect(back).toBe(200);
    const again = await tuner.json(`/api/combinations/${id}`);
    expect(again.data.name ?? again.data.combination?.name).toBe(name);
    const list = await tuner.json(`/api/combinations?search=${encodeURIComponent(name)}`);
    const names = (list.data.items as { name: string }[]).map((c) => c.name);
    expect(names).toContain(name);
    expect(names).not.toContain(name + "-lost");
  });
});
