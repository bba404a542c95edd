// The environment of route handler tests. Its own module, imported first by support.ts,
// because imports are evaluated before the importing module's body: setting these in
// support.ts itself would come after the server modules had already read them.
process.env.DATA_DIR = "memory://";
process.env.NEXTAUTH_SECRET = "route-handler-tests-only";
process.env.BCRYPT_ROUNDS = "4"; // fast hashes; the cost factor is not what these tests check
delete process.env.DATABASE_URL;
delete process.env.SMTP_URL;

export {};
