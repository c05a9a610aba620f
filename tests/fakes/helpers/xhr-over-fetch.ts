// Node has no XMLHttpRequest, which uploadthing/client uses for the browser PUT (to report
// progress). This stand-in sends the very same request with fetch, so the real client code runs in
// Node against the real fake; the browser itself is covered by the Playwright upload check.
type Listener = (ev: { loaded: number; total: number }) => void;

export class FetchXMLHttpRequest {
  status = 0;
  statusText = "";
  response: unknown = null;
  responseType = "";
  readonly upload = { addEventListener: (type: string, fn: Listener) => this.on(`upload:${type}`, fn) };
  private method = "GET";
  private url = "";
  private headers = new Headers();
  private listeners = new Map<string, Listener[]>();
  private controller = new AbortController();

  open(method: string, url: string): void {
    this.method = method;
    this.url = url;
  }
  setRequestHeader(name: string, value: string): void {
    this.headers.set(name, value);
  }
  addEventListener(type: string, fn: Listener): void {
    this.on(type, fn);
  }
  abort(): void {
    this.controller.abort();
  }
  private on(type: string, fn: Listener) {
    this.listeners.set(type, [...(this.listeners.get(type) ?? []), fn]);
  }
  private fire(type: string, loaded = 0, total = 0) {
    for (const fn of this.listeners.get(type) ?? []) fn({ loaded, total });
  }

  send(body: FormData | null): void {
    let total = 0;
    body?.forEach((v) => {
      if (typeof v !== "string") total += v.size;
    });
    fetch(this.url, { method: this.method, headers: this.headers, body, signal: this.controller.signal })
      .then(async (res) => {
        this.fire("upload:progress", total, total);
        this.status = res.status;
        this.statusText = res.statusText;
        const text = await res.text();
        try {
          this.response = this.responseType === "json" ? JSON.parse(text) : text;
        } catch {
          this.response = null;
        }
        this.fire("load");
      })
      .catch(() => this.fire("error"));
  }
}
