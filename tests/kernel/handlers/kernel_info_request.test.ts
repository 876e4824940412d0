import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("kernel_info_request", () => {
  it("kernel_info_request replies protocol 5.3, language_info for caloric and the engineering caution", async () => {
    const r = await memoryKernel().call("shell", "kernel_info_request");
    const c = r.reply!.content as Record<string, any>;
    expect(c.status).toBe("ok");
    expect(c.protocol_version).toBe("5.3");
    expect(c.language_info).toMatchObject({ name: "caloric", file_extension: ".clc", mimetype: "text/x-caloric" });
    expect(c.banner).toMatch(/licensed engineer/);
    expect(c.banner).toMatch(/local codes/);
  });
});
