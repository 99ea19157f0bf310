// Vitest stand-in for the `server-only` marker package, whose real entry throws
// outside a React Server Components bundler. Tests run on the server anyway.
export {};
