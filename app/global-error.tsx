"use client";

export default function GlobalError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en-GB">
      <body style={{ fontFamily: "system-ui, sans-serif", padding: "1.5rem" }}>
        <h1>Slipway could not load</h1>
        <p>Nothing you saved has been lost. Try again in a moment.</p>
        <button type="button" onClick={reset} style={{ minHeight: 44, padding: "0 1rem" }}>
          Try again
        </button>
      </body>
    </html>
  );
}
