import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/health/route";

describe("GET /api/health", () => {
  it("answers ok with the latest migration from the real database", async () => {
    const response = await GET();
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body).toMatchObject({ status: "ok", database: { reachable: true } });
    expect(body.database.latestMigration).toMatch(/^\d{14}_.+\.ts$/);
    expect(typeof body.version).toBe("string");
  });
});
