// @ts-nocheck
"use client";

export default function GlobalError({ reset }: { error: Error; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: "system-ui, sans-serif", padding: 24 }}>
        <h1>Pulleywright could not show this page.</h1>
        <p>Nothing you saved was changed.</p>
        <button onClick={reset}>Try again</button>
      </body>
    </html>
  );
}
