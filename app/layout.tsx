import type { Metadata } from "next";
import type { ReactNode } from "react";
import { Providers } from "@/components/providers";
import { inter, interGreek, serif } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Eigenroom", template: "%s · Eigenroom" },
  description: "Small-room acoustics from survey to signed recommendation.",
  icons: { icon: "/icon.svg" },
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${inter.variable} ${interGreek.variable} ${serif.variable}`}>
      <body className="min-h-screen bg-paper font-sans text-ink antialiased">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
