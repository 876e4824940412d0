/**
 * kernel_info_reply content. Built from constants only, so it can be answered on the main thread
 * before the worker and the language have loaded.
 */
import { PROTOCOL_VERSION, type Json } from "./messages.js";

/** Kept equal to package.json "version" (a test checks); a constant so kernel_info needs no file read. */
export const IMPLEMENTATION_VERSION = "0.1.0";
export const LANGUAGE_NAME = "caloric";
export const FILE_EXTENSION = ".clc";
export const LANGUAGE_MIMETYPE = "text/x-caloric";

export const ENGINEERING_CAUTION =
  "Caution: results support but do not replace the judgement of a qualified, licensed engineer. " +
  "Pressure equipment, relief systems and flammable or toxic gases are governed by local codes and standards; check against them.";

export function kernelInfoContent(implementationVersion: string): Json {
  return {
    status: "ok",
    protocol_version: PROTOCOL_VERSION,
    implementation: "caloric",
    implementation_version: implementationVersion,
    language_info: {
      name: LANGUAGE_NAME,
      version: implementationVersion,
      mimetype: LANGUAGE_MIMETYPE,
      file_extension: FILE_EXTENSION,
      // Closest existing highlighters: the language is an expression language with # comments.
      pygments_lexer: "python",
      codemirror_mode: "python",
      nbconvert_exporter: "script",
    },
    banner:
      `Caloric ${implementationVersion}: engineering thermodynamics with units (real-gas departures, fugacity, saturation).\n` +
      ENGINEERING_CAUTION,
    help_links: [],
    debugger: false,
  };
}
