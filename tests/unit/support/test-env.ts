// Imported first by the app harness, before any module reads the environment: each test file gets
// its own database file, so files can run in parallel without seeing each other's rows.
import { randomBytes } from "node:crypto";
import { tmpdir } from "node:os";
import path from "node:path";

export const TEST_DATABASE_FILE = path.join(tmpdir(), `leeway-unit-${process.pid}-${randomBytes(6).toString("hex")}.db`);

process.env.DATABASE_URL = `file:${TEST_DATABASE_FILE}`;
process.env.NEXTAUTH_SECRET = "unit-test-secret-that-is-long-enough";
process.env.NEXTAUTH_URL = "http://leeway.test";
process.env.LEEWAY_MODE = "demo";
// A port of this file's own; nothing listens there unless the test starts Leeway's local SMTP server.
process.env.SMTP_HOST = "127.0.0.1";
process.env.SMTP_PORT = String(20_000 + (randomBytes(2).readUInt16BE(0) % 30_000));
process.env.SMTP_FROM = "Leeway <leeway@leeway.example>";
