import { AppError } from "@/lib/shared/errors";

/**
 * A document type or entity declaration is refused at the first token, before anything in it is
 * read (ASVS 1.5.1; entity expansion is the classic "billion laughs" attack). GPX never needs either.
 */
export function doctypeRefusal(): AppError {
  return new AppError(
    422,
    "The file contains a DOCTYPE or ENTITY declaration, which GPX files never need. It was refused for safety; export the trail again from your GPS app.",
    "file",
  );
}
