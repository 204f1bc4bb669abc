// @ts-nocheck
// Runs once when a server process starts (Next's instrumentation hook).
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const http = await import("node:http");
  const { stampPeerAddress } = await import("./app/_lib/peer-stamp");
  stampPeerAddress(http.Server);
  const { startMailSender } = await import("./app/_lib/mail-sender");
  startMailSender();
}
