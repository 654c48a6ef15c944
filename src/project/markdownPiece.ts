/** A top-level piece of a Markdown body: prose or a fenced code block, with its 1-based start line. */
export type MarkdownPiece =
  | { readonly kind: "prose"; readonly markdown: string; readonly line: number }
  | {
    readonly kind: "fence";
    /** First word of the info string, read from the fence line itself. */
    readonly info: string;
    /** The whole info string after the fence characters, trimmed. */
    readonly infoString: string;
    /** Raw text of the whole fence, for display. */
    readonly raw: string;
    /** Text between the fences. */
    readonly body: string;
    /** Line of the opening fence. */
    readonly line: number;
    /** Line of the first body line. */
    readonly bodyLine: number;
  };
