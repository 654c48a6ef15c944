import type { Position } from "./position.ts";

/** A YAML value with the position of its first character in the project file. */
export type YamlValue =
  | {
    readonly kind: "scalar";
    readonly value: string | number | boolean | null;
    readonly text: string;
    readonly at: Position;
  }
  | { readonly kind: "map"; readonly entries: readonly YamlEntry[]; readonly at: Position }
  | { readonly kind: "list"; readonly items: readonly YamlValue[]; readonly at: Position };

export interface YamlEntry {
  readonly key: string;
  readonly keyAt: Position;
  readonly value: YamlValue;
}
