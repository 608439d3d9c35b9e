/** The demo story's HTTP side: signs in as a demo member and calls the API's public routes, as the web app does. */
export class StoryHttpError extends Error {
  constructor(
    readonly status: number,
    readonly route: string,
    readonly body: unknown,
  ) {
    const message = typeof body === 'object' && body && 'message' in body ? String((body as { message: unknown }).message) : JSON.stringify(body);
    super(`${route} answered ${status}: ${message}`);
  }
}

/** How long one request of the story may take; the slowest (a quote with its PDF on a busy machine) takes seconds. */
const REQUEST_TIMEOUT_MS = 60_000;

export class StoryClient {
  private constructor(
    private readonly apiUrl: string,
    private readonly token: string | null,
  ) {}

  static anonymous(baseUrl: string): StoryClient {
    return new StoryClient(`${baseUrl.replace(/\/$/, '')}/api`, null);
  }

  static async signIn(baseUrl: string, email: string, password: string): Promise<StoryClient> {
    const { accessToken } = await StoryClient.anonymous(baseUrl).post<{ accessToken: string }>('/auth/sign-in', { email, password });
    return new StoryClient(`${baseUrl.replace(/\/$/, '')}/api`, accessToken);
  }

  get<T>(path: string): Promise<T> {
    return this.send<T>('GET', path);
  }

  post<T>(path: string, body?: unknown): Promise<T> {
    return this.send<T>('POST', path, body);
  }

  put<T>(path: string, body?: unknown): Promise<T> {
    return this.send<T>('PUT', path, body);
  }

  patch<T>(path: string, body?: unknown): Promise<T> {
    return this.send<T>('PATCH', path, body);
  }

  /** A multipart upload of files in the field `photos`, with plain text fields beside them. */
  upload<T>(path: string, files: Array<{ data: Buffer; fileName: string; contentType: string }>, fields: Record<string, string> = {}): Promise<T> {
    const form = new FormData();
    for (const file of files) form.append('photos', new Blob([new Uint8Array(file.data)], { type: file.contentType }), file.fileName);
    for (const [name, value] of Object.entries(fields)) form.append(name, value);
    return this.send<T>('POST', path, form);
  }

  private async send<T>(method: string, path: string, body?: unknown): Promise<T> {
    const headers: Record<string, string> = this.token ? { authorization: `Bearer ${this.token}` } : {};
    let payload: BodyInit | undefined;
    if (body instanceof FormData) payload = body;
    else if (body !== undefined) {
      headers['content-type'] = 'application/json';
      payload = JSON.stringify(body);
    }
    // A request that never answers fails the story with its name instead of holding it (and `npm start`) forever.
    const response = await fetch(`${this.apiUrl}${path}`, { method, headers, body: payload, signal: AbortSignal.timeout(REQUEST_TIMEOUT_MS) }).catch(
      (error: unknown) => {
        throw new Error(`${method} ${path} did not answer: ${error instanceof Error ? error.message : String(error)}`);
      },
    );
    const text = await response.text();
    let parsed: unknown = text;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      // not JSON: keep the text
    }
    if (!response.ok) throw new StoryHttpError(response.status, `${method} ${path}`, parsed);
    return parsed as T;
  }
}

/** Polls `read` until `done` holds (the worker and the provider's webhook take a moment), or fails naming `what`. */
export async function waitFor<T>(what: string, read: () => Promise<T>, done: (value: T) => boolean, timeoutMs = 15_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`timed out after ${timeoutMs} ms waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 60));
  }
}
