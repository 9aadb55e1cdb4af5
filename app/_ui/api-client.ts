/** The result of a JSON call to our API: the data, or the one error shape. */
export type ApiResult<T> =
  | { ok: true; status: number; data: T }
  | { ok: false; status: number; error: { code: string; message: string; fields?: Record<string, string> } };

/** Sends JSON and reads the product's error shape; never throws for an HTTP error or a network failure. */
export async function callApi<T = unknown>(url: string, init: { method?: string; body?: unknown } = {}): Promise<ApiResult<T>> {
  let res: Response;
  try {
    res = await fetch(url, {
      method: init.method ?? (init.body === undefined ? "GET" : "POST"),
      headers: init.body === undefined ? undefined : { "content-type": "application/json" },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      credentials: "same-origin",
    });
  } catch {
    return { ok: false, status: 0, error: { code: "network", message: "The server could not be reached. Nothing was lost; try again." } };
  }
  const json = (await res.json().catch(() => null)) as unknown;
  if (res.ok) return { ok: true, status: res.status, data: json as T };
  const error =
    json && typeof json === "object" && "error" in json && json.error && typeof json.error === "object"
      ? (json.error as { code: string; message: string; fields?: Record<string, string> })
      : { code: `http_${res.status}`, message: `The server answered ${res.status}.` };
  return { ok: false, status: res.status, error };
}
