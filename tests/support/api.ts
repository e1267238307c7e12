/**
 * A small HTTP client for the tests: keeps the session cookie like a browser and sends the
 * Origin header browsers send, so the CSRF check sees ordinary traffic.
 */
export interface ApiResponse<T = any> {
  status: number;
  body: T;
  headers: Headers;
}

export class ApiClient {
  private cookie = '';

  constructor(readonly baseUrl: string) {}

  async request<T = any>(method: string, path: string, body?: unknown, init: { raw?: string; headers?: Record<string, string> } = {}): Promise<ApiResponse<T>> {
    const headers: Record<string, string> = { origin: this.baseUrl, ...init.headers };
    if (this.cookie) headers.cookie = this.cookie;
    let payload: string | undefined = init.raw;
    if (body !== undefined) {
      payload = JSON.stringify(body);
    }
    if (payload !== undefined) headers['content-type'] ??= 'application/json';
    const response = await fetch(this.baseUrl + path, { method, headers, body: payload, redirect: 'manual' });
    for (const setCookie of response.headers.getSetCookie()) {
      const [pair] = setCookie.split(';');
      const [name, value] = pair.split('=');
      if (name === 'quillane_session') this.cookie = value ? `${name}=${value}` : '';
    }
    const text = await response.text();
    let parsed: unknown = text;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      // Not JSON (e.g. the client shell); the raw text is the body.
    }
    return { status: response.status, body: parsed as T, headers: response.headers };
  }

  get<T = any>(path: string) {
    return this.request<T>('GET', path);
  }
  post<T = any>(path: string, body?: unknown) {
    return this.request<T>('POST', path, body ?? {});
  }
  patch<T = any>(path: string, body?: unknown) {
    return this.request<T>('PATCH', path, body ?? {});
  }
  put<T = any>(path: string, body?: unknown) {
    return this.request<T>('PUT', path, body ?? {});
  }
  delete<T = any>(path: string) {
    return this.request<T>('DELETE', path);
  }

  get sessionCookie(): string {
    return this.cookie;
  }
}

export const DEMO_PASSWORD = 'quillane-demo';

export async function signedIn(baseUrl: string, email: string, password = DEMO_PASSWORD): Promise<ApiClient> {
  const client = new ApiClient(baseUrl);
  const response = await client.post('/api/auth/sign-in', { email, password });
  if (response.status !== 200) throw new Error(`sign-in as ${email} failed: ${response.status} ${JSON.stringify(response.body)}`);
  return client;
}
