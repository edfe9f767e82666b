"use client";
import { useRouter } from "next/navigation";
import { useEffect } from "react";

/** How often a page with deliveries still waiting reads them again. */
const EVERY_MS = 3_000;

/** Keeps a notice's delivery page current by itself while anything is still waiting; stops once all are settled. */
export function FollowDeliveries({ waiting }: { waiting: number }) {
  const router = useRouter();
  useEffect(() => {
    if (waiting === 0) return;
    const timer = setInterval(() => router.refresh(), EVERY_MS);
    return () => clearInterval(timer);
  }, [waiting, router]);
  return null;
}
