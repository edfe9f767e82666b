"use client";
import useSWR from "swr";
import type { Board } from "@/lib/conditions/board";
import { fetcher } from "./fetcher";

export const boardKey = (parkSlug: string) => `/api/parks/${encodeURIComponent(parkSlug)}/board`;

/**
 * Today's board, starting from the server render (fallbackData, so the first paint needs no
 * request) and refreshed every minute while the page is open; kept as is while offline.
 */
export function useBoard(parkSlug: string, fallbackData: Board) {
  return useSWR<Board>(boardKey(parkSlug), fetcher, {
    fallbackData,
    refreshInterval: 60_000,
    revalidateOnMount: false,
    revalidateOnFocus: true,
    keepPreviousData: true,
  });
}
