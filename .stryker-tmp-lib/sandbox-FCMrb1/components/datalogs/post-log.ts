// @ts-nocheck
// Posting a log: XMLHttpRequest rather than fetch, because only it reports upload progress.

export type PostLogOutcome = { ok: true; id: string; skipped: { line: number; reason: string }[] } | { ok: false; message: string; lines: string[] };

export function postLog(body: string, onProgress: (fraction: number) => void): Promise<PostLogOutcome> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", "/api/datalogs");
    xhr.setRequestHeader("content-type", "application/json");
    xhr.upload.onprogress = (e) => onProgress(e.lengthComputable ? e.loaded / e.total : 0);
    xhr.onerror = () => resolve({ ok: false, message: "The upload did not reach the server. Check the connection and try again.", lines: [] });
    xhr.onload = () => {
      let data: { id?: string; skipped?: { line: number; reason: string }[]; error?: string; fieldErrors?: Record<string, string[]> } = {};
      try {
        data = JSON.parse(xhr.responseText);
      } catch {
        /* not JSON: handled below */
      }
      if (xhr.status === 201 && data.id) return resolve({ ok: true, id: data.id, skipped: data.skipped ?? [] });
      const lines = Object.entries(data.fieldErrors ?? {}).flatMap(([k, v]) => (k === "text" ? v : v.map((m) => `${k}: ${m}`)));
      resolve({ ok: false, message: data.error ?? `The upload failed (status ${xhr.status}).`, lines });
    };
    xhr.send(body);
  });
}
