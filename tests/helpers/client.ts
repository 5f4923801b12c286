// An HTTP client for the app under test that behaves like a browser tab: it keeps cookies between
// requests and sends the app's own Origin on state-changing requests (override with `origin`).
import { testEnv } from './env.ts';

export interface ApiResponse<T = any> {
  status: number;
  headers: Headers;
  /** Parsed JSON, or null for an empty / non-JSON body. */
  body: T;
  text: string;
}

export interface RequestOptions {
  /** JSON body (serialised) or a raw string (sent as is). */
  body?: unknown;
  headers?: Record<string, string>;
  /** Origin header for POST/PUT/PATCH/DELETE: default the app's own; null sends none. */
  origin?: string | null;
  /** Follow redirects (default false, so tests can assert them). */
  follow?: boolean;
}

export class TestClient {
  readonly cookies = new Map<string, string>();
  constructor(readonly baseUrl: string = testEnv.appUrl) {}

  get = <T = any>(path: string, opts?: RequestOptions) => this.request<T>('GET', path, opts);
  post = <T = any>(path: string, body?: unknown, opts?: RequestOptions) => this.request<T>('POST', path, { ...opts, body });
  put = <T = any>(path: string, body?: unknown, opts?: RequestOptions) => this.request<T>('PUT', path, { ...opts, body });
  patch = <T = any>(path: string, body?: unknown, opts?: RequestOptions) => this.request<T>('PATCH', path, { ...opts, body });
  delete = <T = any>(path: string, opts?: RequestOptions) => this.request<T>('DELETE', path, opts);

  async request<T = any>(method: string, path: string, opts: RequestOptions = {}): Promise<ApiResponse<T>> {
    const headers = new Headers(opts.headers);
    if (method !== 'GET' && method !== 'HEAD') {
      const origin = opts.origin === undefined ? new URL(this.baseUrl).origin : opts.origin;
      if (origin !== null && !headers.has('origin')) headers.set('origin', origin);
    }
    let body: string | undefined;
    if (opts.body !== undefined) {
      body = typeof opts.body === 'string' ? opts.body : JSON.stringify(opts.body);
      if (!headers.has('content-type')) headers.set('content-type', 'application/json');
    }
    if (this.cookies.size) headers.set('cookie', [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; '));
    const res = await fetch(new URL(path, this.baseUrl), { method, headers, body: body ?? null, redirect: opts.follow ? 'follow' : 'manual' });
    this.storeCookies(res.headers);
    const text = await res.text();
    let parsed: unknown = null;
    if (text && res.headers.get('content-type')?.includes('json')) parsed = JSON.parse(text);
    return { status: res.status, headers: res.headers, body: parsed as T, text };
  }

  /** The session cookie value, if any. */
  get sessionToken(): string | undefined {
    return this.cookies.get('tw_session');
  }

  private storeCookies(headers: Headers): void {
    for (const line of headers.getSetCookie()) {
      const [pair = '', ...attrs] = line.split(';');
      const eq = pair.indexOf('=');
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1).trim();
      const expired = attrs.some((a) => /^\s*max-age=0\s*$/i.test(a) || (/^\s*expires=/i.test(a) && Date.parse(a.split('=')[1] ?? '') < Date.now()));
      if (!value || expired) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }
}
