/** What a browser-side call to our JSON API gives back: the body on success, the API's error otherwise. */
export type ApiError = { message: string; field?: string; details?: unknown };
export type ApiResult<T> = { ok: true; status: number; data: T } | { ok: false; status: number; error: ApiError };

const OFFLINE: ApiError = { message: "Loamcast could not be reached. Check your connection and try again; nothing was saved." };

function toResult<T>(status: number, text: string): ApiResult<T> {
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = null;
  }
  if (status >= 200 && status < 300) return { ok: true, status, data: body as T };
  const error = (body as { error?: ApiError } | null)?.error;
  return { ok: false, status, error: error?.message ? error : { message: `The server answered ${status}. Nothing was saved.` } };
}

/** JSON request to one of our routes; never throws. */
export async function sendJson<T>(method: "POST" | "PATCH" | "DELETE", url: string, body?: unknown): Promise<ApiResult<T>> {
  try {
    const response = await fetch(url, {
      method,
      headers: body === undefined ? undefined : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    return toResult<T>(response.status, await response.text());
  } catch {
    return { ok: false, status: 0, error: OFFLINE };
  }
}

/**
 * Multipart upload with progress (fetch cannot report upload progress; XMLHttpRequest can).
 * `onProgress` receives the share sent, 0…1; never throws.
 */
export function uploadForm<T>(url: string, form: FormData, onProgress: (share: number) => void, method: "POST" | "PUT" = "POST"): Promise<ApiResult<T>> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open(method, url);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
    };
    xhr.upload.onload = () => onProgress(1);
    xhr.onload = () => resolve(toResult<T>(xhr.status, xhr.responseText));
    xhr.onerror = () => resolve({ ok: false, status: 0, error: OFFLINE });
    xhr.send(form);
  });
}
