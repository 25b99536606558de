import { afterEach, describe, expect, it } from "vitest";
import { stackSettings } from "@/scripts/services/stack";

afterEach(() => {
  delete process.env.TEST_PORT;
});

describe("stackSettings", () => {
  it("keeps the test profile's ports and database apart from the development ones", () => {
    const dev = stackSettings("dev");
    const test = stackSettings("test");
    expect(test.database).not.toBe(dev.database);
    for (const key of ["appPort", "pgPort", "s3Port", "smtpPort"] as const) expect(test[key]).not.toBe(dev[key]);
  });

  it("refuses a port that is not a whole number from 1024 to 65535, naming the variable", () => {
    process.env.TEST_PORT = "80";
    expect(() => stackSettings("test")).toThrow(/TEST_PORT=80 .*1024 to 65535/);
    process.env.TEST_PORT = "abc";
    expect(() => stackSettings("test")).toThrow(/TEST_PORT=abc/);
  });
});
