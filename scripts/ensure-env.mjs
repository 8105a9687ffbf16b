// Writes a local .env with a fresh random NEXTAUTH_SECRET when there is none (.env is never committed).
import { randomBytes } from "node:crypto";
import { existsSync, readFileSync, writeFileSync } from "node:fs";

if (existsSync(".env")) process.exit(0);
const example = readFileSync(".env.example", "utf8");
const secret = randomBytes(32).toString("base64url");
writeFileSync(".env", example.replace(/^NEXTAUTH_SECRET=.*$/m, `NEXTAUTH_SECRET=${secret}`), { mode: 0o600 });
console.log("wrote .env with a new random NEXTAUTH_SECRET");
