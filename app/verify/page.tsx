import type { Metadata } from "next";
import { VerifyForm } from "@/components/reports/verify-form";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Check a report" };

/** Public: anyone holding a report can check that it is genuine and unchanged. */
export default function VerifyPage() {
  return (
    <main className="mx-auto max-w-2xl px-4 py-12">
      <p className="mb-1 text-xs font-medium uppercase tracking-[0.08em] text-kiln-600">Eigenroom</p>
      <h1 className="mb-2 text-2xl font-semibold">Check a report</h1>
      <p className="mb-6 text-sm text-ink-soft">
        Every report we issue is digitally signed. Upload the PDF to see whether it is exactly the file that was signed, or enter its report number and SHA-256. The file is checked and
        not kept.
      </p>
      <Card>
        <VerifyForm />
      </Card>
    </main>
  );
}
