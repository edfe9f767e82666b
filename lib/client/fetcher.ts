/** The one fetcher every SWR hook uses: JSON, with the API's error message kept on failure. */
export class FetchError extends Error {
  constructor(
    message: string,
    readonly status: number,
  ) {
    super(message);
    this.name = "FetchError";
  }
}

export async function fetcher<T>(url: string): Promise<T> {
  const response = await fetch(url, { headers: { accept: "application/json" } });
  if (!response.ok) {
    const body = (await response.json().catch(() => null)) as { error?: { message?: string } } | null;
    throw new FetchError(body?.error?.message ?? `Request failed (${response.status}).`, response.status);
  }
  return (await response.json()) as T;
}
