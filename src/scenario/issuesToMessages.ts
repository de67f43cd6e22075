/**
 * Turns zod issues into ValidationMessages: a JSON Pointer, the offending value as given, and the
 * schema's sentence of what is allowed. Union failures are narrowed to the branch whose type
 * matched, so {"crossSection": "round"} is reported at /shapeFactor/crossSection.
 */
import type * as z from 'zod';
import { lookUpPath, toJsonPointer } from '../json/jsonPointer';
import { previewValue } from './previewValue';
import type { ValidationMessage } from './validationMessage';

type Issue = z.core.$ZodIssue;

/** Collects messages up to `limit`, counting the rest. */
class MessageSink {
  readonly messages: ValidationMessage[] = [];
  dropped = 0;
  constructor(private readonly limit: number) {}
  get full(): boolean {
    return this.messages.length >= this.limit;
  }
  add(message: ValidationMessage): void {
    if (this.full) this.dropped++;
    else this.messages.push(message);
  }
}

export function issuesToMessages(issues: readonly Issue[], input: unknown, limit: number): ValidationMessage[] {
  const sink = new MessageSink(limit);
  for (const issue of issues) addIssue(sink, issue, [], input);
  if (sink.dropped > 0) {
    sink.messages.push({
      path: '',
      message: `${sink.dropped} further error${sink.dropped === 1 ? '' : 's'} not listed; fix the ones above first`,
    });
  }
  return sink.messages;
}

function addIssue(sink: MessageSink, issue: Issue, base: readonly PropertyKey[], input: unknown): void {
  const path = [...base, ...issue.path];
  if (issue.code === 'unrecognized_keys') {
    for (const key of issue.keys) {
      // Past the limit only the count matters; avoid building a million messages.
      if (sink.full) {
        sink.dropped += 1;
        continue;
      }
      sink.add({
        path: toJsonPointer([...path, key]),
        message: `unknown key ${previewValue(key)} is not allowed; ${issue.message}`,
      });
    }
    return;
  }
  if (issue.code === 'invalid_union' && issue.errors.length > 0) {
    const matching = issue.errors.filter((branch) => !branch.some((i) => i.code === 'invalid_type' && i.path.length === 0));
    if (matching.length === 1) {
      for (const inner of matching[0]) addIssue(sink, inner, path, input);
      return;
    }
  }
  sink.add({ path: toJsonPointer(path), message: describe(input, path, issue.message) });
}

/** "<value> is not allowed; <allowed>", or a missing-key sentence. */
function describe(input: unknown, path: readonly PropertyKey[], allowed: string): string {
  let found: ReturnType<typeof lookUpPath>;
  try {
    found = lookUpPath(input, path);
  } catch {
    return `an unreadable value is not allowed; ${allowed}`;
  }
  if (!found.found) {
    return `this required ${typeof path[path.length - 1] === 'number' ? 'item' : 'key'} is missing; ${allowed}`;
  }
  return `${previewValue(found.value)} is not allowed; ${allowed}`;
}
