"use client";

/** The root layout itself failed. `retry` fetches it again from the server; `reset` would not. */
export default function GlobalError({ retry }: { error: Error & { digest?: string }; retry: () => void }) {
  return (
    <html lang="en-GB">
      <body style={{ fontFamily: "system-ui, sans-serif", padding: "1.5rem" }}>
        <h1>Slipway could not load</h1>
        <p>What you saved before is kept. Try again in a moment.</p>
        <button type="button" onClick={retry} style={{ minHeight: 44, padding: "0 1rem" }}>
          Try again
        </button>
      </body>
    </html>
  );
}
