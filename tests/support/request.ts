/** The request a test is "in": cookies, headers and what was revalidated. */
type CookieValue = { name: string; value: string };

class MemoryCookieStore {
  private readonly jar = new Map<string, string>();
  get(name: string): CookieValue | undefined {
    const value = this.jar.get(name);
    return value === undefined ? undefined : { name, value };
  }
  getAll(): CookieValue[] {
    return [...this.jar].map(([name, value]) => ({ name, value }));
  }
  has(name: string): boolean {
    return this.jar.has(name);
  }
  set(name: string, value: string): this {
    if (value === "") this.jar.delete(name);
    else this.jar.set(name, value);
    return this;
  }
  delete(name: string): this {
    this.jar.delete(name);
    return this;
  }
  clear(): void {
    this.jar.clear();
  }
}

export const requestState = {
  cookieStore: new MemoryCookieStore(),
  headers: new Headers({ host: "127.0.0.1:3000", "x-forwarded-for": "127.0.0.1" }),
  revalidated: [] as string[],
};

/** Starts a new "request" from a given client address with no cookies. */
export function freshRequest(ip = "127.0.0.1"): void {
  requestState.cookieStore.clear();
  requestState.headers = new Headers({ host: "127.0.0.1:3000", "x-forwarded-for": ip });
  requestState.revalidated = [];
}
