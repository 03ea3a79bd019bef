import { describe, expect, it } from "vitest";
import { parseEnv } from "../../../server/env";

const base = { DATABASE_URL: "postgres://postgres@127.0.0.1:54310/equilibrist", SESSION_SECRET: "0123456789abcdef" };

describe("parseEnv", () => {
  it("applies the documented defaults", () => {
    const env = parseEnv(base);
    expect(env).toMatchObject({ PORT: 4310, SMTP_HOST: "127.0.0.1", SMTP_PORT: 2525, NODE_ENV: "development" });
    expect(env.APP_URL).toBe("http://127.0.0.1:4310");
  });

  it("derives APP_URL from PORT and trims a trailing slash", () => {
    expect(parseEnv({ ...base, PORT: "4311" }).APP_URL).toBe("http://127.0.0.1:4311");
    expect(parseEnv({ ...base, APP_URL: "https://eq.example/" }).APP_URL).toBe("https://eq.example");
  });

  it("names every wrong variable", () => {
    let message = "";
    try {
      parseEnv({ PORT: "99999", SESSION_SECRET: "short" });
    } catch (err) {
      message = String((err as Error).message);
    }
    expect(message).toMatch(/DATABASE_URL/);
    expect(message).toMatch(/SESSION_SECRET/);
    expect(message).toMatch(/PORT/);
  });
});
