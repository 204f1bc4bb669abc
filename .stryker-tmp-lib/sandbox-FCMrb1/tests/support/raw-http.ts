// @ts-nocheck
// Plain node:http requests for what fetch cannot do: send from another loopback address (the app
// keys sign-in limits on the socket address), and stream a body while watching for an early answer.
import http from "node:http";
import { BASE_URL } from "./http";

export type RawAnswer = { status: number; headers: http.IncomingHttpHeaders; body: string };

export function rawRequest(path: string, opts: { method?: string; headers?: Record<string, string>; body?: string; localAddress?: string } = {}): Promise<RawAnswer> {
  const url = new URL(path, BASE_URL);
  return new Promise((resolve, reject) => {
    const req = http.request(url, { method: opts.method ?? "GET", headers: opts.headers, localAddress: opts.localAddress }, (res) => {
      let body = "";
      res.setEncoding("utf8");
      res.on("data", (c) => (body += c));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on("error", reject);
    req.end(opts.body);
  });
}

/**
 * Streams up to `totalBytes` of `chunk`-sized pieces (chunked, or with its length declared) and stops as
 * soon as the server answers. Returns the status and how many bytes had been written by then.
 */
export function streamUntilAnswered(path: string, opts: { headers?: Record<string, string>; totalBytes: number; chunk?: number; declareLength?: boolean }): Promise<{ status: number; written: number; ms: number }> {
  const url = new URL(path, BASE_URL);
  const piece = Buffer.alloc(opts.chunk ?? 64 * 1024, 0x61);
  const started = Date.now();
  return new Promise((resolve, reject) => {
    let written = 0;
    let answered = false;
    const req = http.request(url, { method: "POST", headers: { ...opts.headers, ...(opts.declareLength ? { "content-length": String(opts.totalBytes) } : { "transfer-encoding": "chunked" }) } }, (res) => {
      answered = true;
      resolve({ status: res.statusCode ?? 0, written, ms: Date.now() - started });
      req.destroy();
    });
    req.on("error", (e) => (answered ? undefined : reject(e)));
    const pump = () => {
      while (!answered && written < opts.totalBytes) {
        written += piece.length;
        if (!req.write(piece)) return void req.once("drain", pump);
      }
      if (!answered) req.end();
    };
    pump();
  });
}
