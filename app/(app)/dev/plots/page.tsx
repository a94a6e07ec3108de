import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/card";
import { PlotGallery } from "@/components/plots/preview/gallery";
import { sampleData } from "@/components/plots/preview/sample-data";

export const metadata: Metadata = { title: "Plot gallery" };

/**
 * Development gallery: every plot with sample data computed by lib/modes, lib/porous and lib/reverb for an
 * invented 5.8 × 4.1 × 2.5 m room, for screenshots and review. Sign-in is required by the (app) layout.
 */
export default function PlotGalleryPage() {
  const data = sampleData();
  return (
    <>
      <PageHeader title="Plot gallery" eyebrow="Development">
        Every plot, drawn from the engines for a sample room of 5.8 × 4.1 × 2.5 m with three seats and one subwoofer.
      </PageHeader>
      <PlotGallery data={data} />
    </>
  );
}
