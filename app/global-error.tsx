"use client";

export default function GlobalError({ reset }: { error: Error; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: "system-ui, sans-serif", background: "#f7f4ee", color: "#1f2328", padding: 40 }}>
        <h1>Eigenroom could not load this page</h1>
        <p>The error has been logged. Nothing you saved was lost.</p>
        <button onClick={reset}>Try again</button>
      </body>
    </html>
  );
}
