// Route handlers whose role checks are walked in their own test files (for example the
// calculation contract routes in tests/integration/calc-api.integ.ts).
export const EXTRA_KEYS: string[] = ["POST /api/v1/evaluate", "POST /api/v1/rate", "POST /api/v1/reverb"];
