/**
 * Two inline paths of marked take more than linear time, and the tokenizer here bounds both.
 *
 * Nesting: emphasis, strikethrough and link text are read by reading their content again one call
 * deeper, so `*a *a … a* a*` costs a pass over the text per level and some ten thousand levels
 * overflow the stack. Past `MAX_INLINE_NESTING` levels the marks are kept as literal text.
 *
 * E-mail autolinks: marked's GFM e-mail autolink rules look ahead over a whole run of address characters (`[…]+@`) at
 * every place an inline token starts. In a long run split into many tokens, such as `_a_a_a…` or
 * `*a*a*a…`, each token rescans the rest of the run, so a 128 KiB paragraph takes minutes. The
 * tokenizer here reads the same rules with the run bounded to 64 characters, the longest local part
 * an address may have (RFC 5321, section 4.5.3.1.1), so each token looks ahead a bounded distance and
 * every address that can exist is still linked.
 */
import { Tokenizer, type TokenizerObject, type Tokens } from "marked";

/** Deepest nesting of emphasis, strikethrough and links read as markup (common practice, no source: prose nests two or three). */
export const MAX_INLINE_NESTING = 8;

/** Inline levels being read right now (the lexer is synchronous, so one counter serves every call). */
let inlineDepth = 0;

/** Runs `read` one nesting level deeper, or returns undefined (the marks stay text) past the limit. */
function nested<T>(read: () => T): T | undefined {
  if (inlineDepth >= MAX_INLINE_NESTING) return undefined;
  inlineDepth++;
  try {
    return read();
  } finally {
    inlineDepth--;
  }
}

/** Longest local part of an e-mail address, octets (RFC 5321, section 4.5.3.1.1). */
export const MAX_EMAIL_LOCAL_PART = 64;

/** The character classes of address runs in marked's GFM `url` and `text` rules. */
const ADDRESS_CLASSES = ["[A-Za-z0-9._+-]", "[a-zA-Z0-9.!#$%&'*+\\/=?_`{\\|}~-]"] as const;

/** `rule` with every `<address class>+@` (or `+(@)`) run bounded to the longest local part. */
function bounded(rule: RegExp): RegExp {
  let source = rule.source;
  let replaced = 0;
  for (const run of ADDRESS_CLASSES) {
    for (const at of ["@", "(@)"]) {
      const parts = source.split(`${run}+${at}`);
      replaced += parts.length - 1;
      source = parts.join(`${run}{1,${MAX_EMAIL_LOCAL_PART}}${at}`);
    }
  }
  if (replaced === 0) throw new Error(`marked's GFM rule changed: no address run found in ${rule.source}`);
  return new RegExp(source, rule.flags);
}

type Rules = Tokenizer["rules"];

/** Inline rule sets with the bounded `url` and `text`, built once per marked rule set. */
const boundedInline = new WeakMap<Rules["inline"], Rules["inline"]>();
/** A lexer's rules with the bounded inline rules, built once per lexer. */
const boundedRules = new WeakMap<Rules, Rules>();

/** Runs `read` with the bounded rules in place of marked's own `url` and `text` rules. */
function withBoundedRules<T>(tokenizer: Tokenizer, read: () => T): T {
  const rules = tokenizer.rules;
  let swapped = boundedRules.get(rules);
  if (swapped === undefined) {
    let inline = boundedInline.get(rules.inline);
    if (inline === undefined) {
      inline = { ...rules.inline, url: bounded(rules.inline.url), text: bounded(rules.inline.text) };
      boundedInline.set(rules.inline, inline);
    }
    boundedRules.set(rules, swapped = { ...rules, inline });
  }
  tokenizer.rules = swapped;
  try {
    return read();
  } finally {
    tokenizer.rules = rules;
  }
}

/**
 * Tokenizer overrides (for marked's `tokenizer` option) whose inline scans take time linear in the
 * text; each runs marked's own method, with the bounded rules or under the nesting limit.
 */
export const linearInlineTokenizer: TokenizerObject = {
  url(this: Tokenizer, src: string): Tokens.Link | undefined {
    return withBoundedRules(this, () => Tokenizer.prototype.url.call(this, src));
  },
  inlineText(this: Tokenizer, src: string): Tokens.Text | undefined {
    return withBoundedRules(this, () => Tokenizer.prototype.inlineText.call(this, src));
  },
  emStrong(this: Tokenizer, src: string, maskedSrc: string, prevChar?: string) {
    return nested(() => Tokenizer.prototype.emStrong.call(this, src, maskedSrc, prevChar));
  },
  del(this: Tokenizer, src: string, maskedSrc: string, prevChar?: string) {
    return nested(() => Tokenizer.prototype.del.call(this, src, maskedSrc, prevChar));
  },
  link(this: Tokenizer, src: string) {
    return nested(() => Tokenizer.prototype.link.call(this, src));
  },
  reflink(this: Tokenizer, src: string, links: Parameters<Tokenizer["reflink"]>[1]) {
    return nested(() => Tokenizer.prototype.reflink.call(this, src, links));
  },
};
