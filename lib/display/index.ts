export { MIME } from "./mime.js";
export type { MimeBundle } from "./mime.js";
