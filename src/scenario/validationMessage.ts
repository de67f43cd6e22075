/** One error or warning about a scenario. */
export interface ValidationMessage {
  /** JSON Pointer (RFC 6901) to the offending value: "/ice/A", "/bed/3/0"; "" is the whole input. */
  path: string;
  /** One readable sentence: the value, and what is allowed or why it is odd. */
  message: string;
  /** For text that is not valid JSON: where the problem is (1-based; column in characters). */
  line?: number;
  column?: number;
}

/** "<path>: <message>", the root shown as "/". */
export function formatMessage(m: ValidationMessage): string {
  return `${m.path === '' ? '/' : m.path}: ${m.message}`;
}
