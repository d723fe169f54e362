/**
 * A tiny HTTP client for API tests: keeps cookies like a browser, sends the Origin header that
 * better-auth requires on state-changing requests, and never follows redirects by itself.
 */
export interface HttpResponse<T = unknown> {
  status: number;
  headers: Headers;
  body: T;
}

export class HttpClient {
  private cookies = new Map<string, string>();

  /** Headers sent with every request, e.g. an X-Forwarded-For a test forges or a proxy would add. */
  constructor(
    readonly baseUrl: string,
    readonly extraHeaders: Record<string, string> = {},
  ) {}

  get signedIn(): boolean {
    return [...this.cookies.keys()].some((name) => name.includes('session_token'));
  }

  /** The Cookie header this client sends, for a test that builds a request of its own. */
  get cookieHeader(): string {
    return [...this.cookies].map(([name, value]) => `${name}=${value}`).join('; ');
  }

  async request<T = any>(method: string, path: string, body?: unknown): Promise<HttpResponse<T>> {
    const headers = this.headers({ Accept: 'application/json', ...(body !== undefined ? { 'Content-Type': 'application/json' } : {}) });
    return this.readJson<T>(await this.send(path, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) }));
  }

  /** Sends one file as multipart/form-data, as a browser's file input does, with any text fields of the form before it. */
  async upload<T = any>(path: string, field: string, bytes: Uint8Array, fileName: string, type = 'application/octet-stream', fields: Record<string, string> = {}): Promise<HttpResponse<T>> {
    const form = new FormData();
    for (const [name, value] of Object.entries(fields)) form.append(name, value);
    form.append(field, new Blob([new Uint8Array(bytes)], { type }), fileName);
    return this.readJson<T>(await this.send(path, { method: 'POST', headers: this.headers({ Accept: 'application/json' }), body: form }));
  }

  /** The raw bytes of an answer (a photo, a ZIP). */
  async bytes(path: string): Promise<{ status: number; headers: Headers; bytes: Uint8Array }> {
    const response = await this.send(path, { headers: this.headers() });
    return { status: response.status, headers: response.headers, bytes: new Uint8Array(await response.arrayBuffer()) };
  }

  /** Origin (better-auth and the app check it on changes), the extra headers, and the cookies kept. */
  private headers(more: Record<string, string> = {}): Record<string, string> {
    const headers: Record<string, string> = { Origin: this.baseUrl, ...more, ...this.extraHeaders };
    if (this.cookies.size) headers.Cookie = this.cookieHeader;
    return headers;
  }

  /** Sends without following redirects, and keeps the cookies the answer sets or expires. */
  private async send(path: string, init: RequestInit): Promise<Response> {
    const response = await fetch(new URL(path, this.baseUrl), { ...init, redirect: 'manual' });
    for (const cookie of response.headers.getSetCookie()) {
      const [pair = '', ...attributes] = cookie.split(';');
      const index = pair.indexOf('=');
      const name = pair.slice(0, index).trim();
      const value = pair.slice(index + 1).trim();
      const expired = attributes.some((a) => /max-age=0\b/i.test(a.trim())) || value === '';
      if (expired) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
    return response;
  }

  /** The answer's JSON, or its text when it is not JSON. */
  private async readJson<T>(response: Response): Promise<HttpResponse<T>> {
    const text = await response.text();
    let parsed: unknown = text;
    try {
      parsed = text ? JSON.parse(text) : undefined;
    } catch {
      // not JSON: keep the text
    }
    return { status: response.status, headers: response.headers, body: parsed as T };
  }

  get<T = any>(path: string) {
    return this.request<T>('GET', path);
  }
  post<T = any>(path: string, body: unknown = {}) {
    return this.request<T>('POST', path, body);
  }
  patch<T = any>(path: string, body: unknown) {
    return this.request<T>('PATCH', path, body);
  }
}
