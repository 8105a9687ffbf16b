import { app } from "../support/app";
import { beforeEach, describe, expect, it } from "vitest";
import { users } from "@/db/schema";
import { demoAccountsBlockingProduction } from "@/lib/auth/demo-safety";
import { getEnv } from "@/lib/env";

beforeEach(() => app.reset());
const inMode = (mode: "demo" | "production") => ({ ...getEnv(), LEEWAY_MODE: mode });

describe("demo safety", () => {
  it("refuses a production start while a demo account exists, naming it", async () => {
    await app.db.insert(users).values({ email: "admin@leeway.example", name: "Demo admin", role: "admin", isDemo: true });
    const reason = await demoAccountsBlockingProduction(inMode("production"));
    expect(reason).toContain("will not start in production mode");
    expect(reason).toContain("admin@leeway.example");
  });

  it("lets production start without demo accounts, and demo mode start with them", async () => {
    expect(await demoAccountsBlockingProduction(inMode("production"))).toBeNull();
    await app.db.insert(users).values({ email: "admin@leeway.example", name: "Demo admin", role: "admin", isDemo: true });
    expect(await demoAccountsBlockingProduction(inMode("demo"))).toBeNull();
  });
});
