/**
 * HMAC signatures of Jupyter messages: the digest runs over the header, parent_header, metadata and
 * content frames in that order; the key is the connection file's key string taken as UTF-8 bytes.
 * An empty key means signing is off (the spec's rule): sign() returns "" and every message passes.
 */
import { createHmac, getHashes, timingSafeEqual } from "node:crypto";

export interface Signer {
  readonly enabled: boolean;
  sign(parts: readonly Buffer[]): string;
  /** Constant-time comparison of a received hex signature against the expected one. */
  verify(signature: string, parts: readonly Buffer[]): boolean;
}

export function createSigner(key: string, scheme = "hmac-sha256"): Signer {
  const algorithm = scheme.replace(/^hmac-/, "");
  if (!scheme.startsWith("hmac-") || !getHashes().includes(algorithm)) {
    throw new Error(`signature_scheme ${JSON.stringify(scheme)} is not supported (expected hmac-sha256)`);
  }
  const keyBytes = Buffer.from(key, "utf8");
  const enabled = keyBytes.length > 0;
  const sign = (parts: readonly Buffer[]): string => {
    if (!enabled) return "";
    const h = createHmac(algorithm, keyBytes);
    for (const p of parts) h.update(p);
    return h.digest("hex");
  };
  return {
    enabled,
    sign,
    verify(signature, parts) {
      if (!enabled) return true;
      const expected = Buffer.from(sign(parts), "utf8");
      const got = Buffer.from(signature, "utf8");
      // Length is not secret (it is fixed by the algorithm); the bytes are compared in constant time.
      return got.length === expected.length && timingSafeEqual(got, expected);
    },
  };
}
