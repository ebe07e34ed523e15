// Stands in for the `server-only` package when scripts run under tsx (see tsconfig.scripts.json).
export {};
