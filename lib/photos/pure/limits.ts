/** Limits for hazard photos (ASVS v5.0.0 5.2.1, 5.2.2). Change them here and nowhere else. */
export const PHOTO_LIMITS = {
  /** Largest file accepted, checked before decoding. */
  maxBytes: 8 * 1024 * 1024,
  /** Most photos on one hazard. */
  maxPerHazard: 4,
  /** Width × height refused before decoding: a small file can claim a huge canvas. */
  maxPixels: 40_000_000,
  /** Longest side of the stored photo and of its thumbnail. */
  fullMaxPx: 2048,
  thumbMaxPx: 320,
  /** JPEG quality of what we store. */
  quality: 82,
} as const;

/** Largest multipart body for a hazard: every photo at its limit plus the text fields. */
export const MAX_HAZARD_BODY_BYTES = PHOTO_LIMITS.maxBytes * PHOTO_LIMITS.maxPerHazard + 64 * 1024;
