import { execFileSync } from "node:child_process";
import { describe, expect, it } from "vitest";
import { createSigner } from "../../../kernel/wire/index.js";

describe("createSigner", () => {
  it("createSigner matches HMAC-SHA256 test case 2 of RFC 4231", () => {
    // RFC 4231 section 4.3: key "Jefe", data "what do ya want for nothing?"
    const s = createSigner("Jefe");
    expect(s.sign([Buffer.from("what do ya "), Buffer.from("want for nothing?")])).toBe(
      "5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843",
    );
  });

  it("createSigner agrees with jupyter_client's Session.sign (reference implementation, python3-jupyter-client)", () => {
    const parts = ['{"msg_id":"1"}', "{}", "{}", '{"code":"1+1 °C"}'];
    const py = `import sys,json\nfrom jupyter_client.session import Session\ns=Session(key=b"s\\xc3\\xa9cret",signature_scheme="hmac-sha256")\nprint(s.sign([p.encode() for p in json.loads(sys.argv[1])]).decode())`;
    const expected = execFileSync("/usr/bin/python3", ["-c", py, JSON.stringify(parts)], { encoding: "utf8" }).trim();
    // key "sécret": the connection file's string taken as UTF-8 bytes
    expect(createSigner("sécret").sign(parts.map((p) => Buffer.from(p)))).toBe(expected);
  });

  it("createSigner.verify accepts the right signature and refuses a changed one or a changed part", () => {
    const s = createSigner("k");
    const parts = [Buffer.from("a"), Buffer.from("b")];
    const sig = s.sign(parts);
    expect(s.verify(sig, parts)).toBe(true);
    expect(s.verify(sig.slice(0, -1) + (sig.endsWith("0") ? "1" : "0"), parts)).toBe(false);
    expect(s.verify(sig, [Buffer.from("a"), Buffer.from("c")])).toBe(false);
    expect(s.verify("", parts)).toBe(false);
    expect(s.verify(sig + "00", parts)).toBe(false);
  });

  it("createSigner with an empty key disables signing (messaging spec: empty key, no auth)", () => {
    const s = createSigner("");
    expect(s.enabled).toBe(false);
    expect(s.sign([Buffer.from("x")])).toBe("");
    expect(s.verify("", [Buffer.from("x")])).toBe(true);
  });

  it("createSigner rejects an unknown scheme by name", () => {
    expect(() => createSigner("k", "rot13")).toThrow(/signature_scheme "rot13"/);
    expect(() => createSigner("k", "hmac-nosuchhash")).toThrow(/hmac-nosuchhash/);
  });
});
