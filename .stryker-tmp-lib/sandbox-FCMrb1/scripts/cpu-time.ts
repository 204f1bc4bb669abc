// @ts-nocheck
// CPU time used so far by the processes of a benchmark, read from /proc (Linux): the app's
// process group, PostgreSQL's processes, and this process (the load generator). CPU time per
// request is steadier than latency on a shared machine, and it says where the time goes.
import fs from "node:fs";

const TICKS_PER_S = 100; // USER_HZ; 100 on every Linux this project runs on

export type CpuSplit = { app: number; postgres: number; loadGenerator: number };

/** Milliseconds of CPU (user + system) used so far, split by who used it. */
export function cpuSplit(appGroup: number): CpuSplit {
  const out: CpuSplit = { app: 0, postgres: 0, loadGenerator: 0 };
  for (const pid of fs.readdirSync("/proc")) {
    if (!/^\d+$/.test(pid)) continue;
    let stat: string, cmd: string;
    try {
      stat = fs.readFileSync(`/proc/${pid}/stat`, "utf8");
      cmd = fs.readFileSync(`/proc/${pid}/cmdline`, "utf8");
    } catch {
      continue; // ended while we looked
    }
    // Fields after the command name (which may hold spaces): state ppid pgrp … utime(12) stime(13).
    const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
    const ms = ((Number(f[11]) + Number(f[12])) / TICKS_PER_S) * 1000;
    if (Number(pid) === process.pid) out.loadGenerator += ms;
    else if (Number(f[2]) === appGroup) out.app += ms;
    else if (cmd.startsWith("postgres") || cmd.includes("/postgres\0")) out.postgres += ms;
  }
  return out;
}
