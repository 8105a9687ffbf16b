// Vitest runs server modules directly; the real "server-only" package throws outside React Server Components.
export {};
