import type { Metadata } from "next";
import { ServiceWorker } from "@/components/offline/service-worker";

type Props = { params: Promise<{ parkSlug: string }>; children: React.ReactNode };

/** A park's pages install as that park's app and keep working offline. */
export async function generateMetadata({ params }: Pick<Props, "params">): Promise<Metadata> {
  const { parkSlug } = await params;
  return { manifest: `/parks/${parkSlug}/manifest.webmanifest`, appleWebApp: { capable: true, title: "Loamcast", statusBarStyle: "default" } };
}

export default function ParkLayout({ children }: Props) {
  return <ServiceWorker>{children}</ServiceWorker>;
}
