import { describe, expect, it } from "vitest";
import { MIME, VEGA_LITE_SCHEMA } from "../../../lib/display/mime.js";

describe("MIME", () => {
  it("MIME uses the Jupyter / IANA type strings front ends render", () => {
    // Source: Jupyter messaging spec (display_data) and the Vega-Lite v5 renderer's registered MIME type.
    expect(MIME.text).toBe("text/plain");
    expect(MIME.html).toBe("text/html");
    expect(MIME.svg).toBe("image/svg+xml");
    expect(MIME.png).toBe("image/png");
    expect(MIME.vegalite).toBe("application/vnd.vegalite.v5+json");
  });
  it("MIME types are unique", () => {
    const values = Object.values(MIME);
    expect(new Set(values).size).toBe(values.length);
  });
});

describe("VEGA_LITE_SCHEMA", () => {
  it("VEGA_LITE_SCHEMA has the major version of the Vega-Lite MIME type", () => {
    // Source: Vega-Lite schema URLs are https://vega.github.io/schema/vega-lite/v<major>.json.
    const major = /vegalite\.v(\d+)\+json$/.exec(MIME.vegalite)![1];
    expect(VEGA_LITE_SCHEMA).toBe(`https://vega.github.io/schema/vega-lite/v${major}.json`);
  });
});
