import localFont from "next/font/local";

// Shipped with the app (copied from @fontsource-variable, SIL Open Font License): nothing is downloaded.
export const inter = localFont({ src: "./fonts/inter-latin-wght-normal.woff2", weight: "100 900", variable: "--font-inter", display: "swap" });
export const interGreek = localFont({ src: "./fonts/inter-greek-wght-normal.woff2", weight: "100 900", variable: "--font-inter-greek", display: "swap", preload: false });
export const serif = localFont({ src: "./fonts/source-serif-4-latin-wght-normal.woff2", weight: "200 900", variable: "--font-serif", display: "swap" });
