/** The error every API call rejects with: what the server said, in words a person can act on. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
    /** The next step the server names with a refusal, e.g. { label: 'Add a recipe', href: '/h/…/recipes/new' }. */
    readonly action?: { label: string; href: string },
  ) {
    super(message);
  }
}

function actionOf(details: unknown): ApiError['action'] {
  const action = (details as { action?: { label?: unknown; href?: unknown } } | undefined)?.action;
  // Only an address inside the app: the link is followed without a page load.
  return typeof action?.label === 'string' &&
    typeof action.href === 'string' &&
    action.href.startsWith('/') &&
    !action.href.startsWith('//')
    ? { label: action.label, href: action.href }
    : undefined;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions {
  /** Sent as the Idempotency-Key header: the server applies a change sent again under the same key only once. */
  idempotencyKey?: string;
}

async function request<T>(method: Method, url: string, body?: unknown, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined && !(body instanceof FormData)) headers['Content-Type'] = 'application/json';
  if (options.idempotencyKey) headers['Idempotency-Key'] = options.idempotencyKey;
  let response: Response;
  try {
    response = await fetch(`/api${url}`, {
      method,
      credentials: 'same-origin',
      headers,
      body: body === undefined ? undefined : body instanceof FormData ? body : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, 'offline', 'Larderly cannot be reached. Check your connection and try again.');
  }
  if (response.status === 204) return undefined as T;
  const payload = await response.json().catch(() => null);
  if (!response.ok) {
    const error = payload?.error;
    throw new ApiError(
      response.status,
      error?.code ?? 'unknown',
      error?.message ?? `The server answered ${response.status}. Try again.`,
      error?.fields,
      actionOf(error?.details),
    );
  }
  return payload as T;
}

export const api = {
  get: <T>(url: string) => request<T>('GET', url),
  post: <T>(url: string, body?: unknown, options?: RequestOptions) => request<T>('POST', url, body ?? {}, options),
  patch: <T>(url: string, body: unknown, options?: RequestOptions) => request<T>('PATCH', url, body, options),
  put: <T>(url: string, body: unknown) => request<T>('PUT', url, body),
  delete: <T = void>(url: string, body?: unknown) => request<T>('DELETE', url, body),
};
