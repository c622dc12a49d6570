"use client";
// The last resort when the root layout itself fails: its own document, plain styles, a retry.
import { isDatabaseDownDigest } from "@/components/page-errors";

export default function GlobalError({ error, retry }: { error: unknown; retry: () => void }) {
  const dbDown = isDatabaseDownDigest(error);
  return (
    <html lang="en">
      <body style={{ margin: 0, fontFamily: "system-ui, sans-serif", background: "#f7f6f2", color: "#1c2430" }}>
        <title>Farfield</title>
        <main style={{ maxWidth: "28rem", margin: "15vh auto", padding: "0 1rem" }}>
          <h1 style={{ fontSize: "1.5rem" }}>{dbDown ? "Database unavailable" : "Farfield could not load"}</h1>
          <p style={{ lineHeight: 1.5 }}>
            {dbDown ? "The database cannot be reached right now. Nothing is lost; try again in a moment." : "Something went wrong while loading the app."}
          </p>
          <button
            type="button"
            onClick={() => retry()}
            style={{ minHeight: 44, padding: "0 1.25rem", fontSize: "1rem", fontWeight: 600, borderRadius: 8, border: "1px solid #1f4d31", background: "#2f6b46", color: "white" }}
          >
            Try again
          </button>
        </main>
      </body>
    </html>
  );
}
