// Vitest runs server modules outside Next; the real "server-only" throws outside a server component graph.
export {};
