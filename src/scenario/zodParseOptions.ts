/**
 * Options for every safeParse of the validators. `jitless`: zod otherwise compiles each object
 * schema's parser with `new Function` on its first parse, which costs a one-shot command such as
 * `firnline check` about 9 ms of its start-up and gains nothing measurable on a scenario (the
 * demo's second parse takes 0.3 ms either way; measured in docs/performance.md, section 4a).
 */
export const ZOD_PARSE_OPTIONS = { jitless: true } as const;
