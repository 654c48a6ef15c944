/**
 * Prints test/scenarios/_demoSnapshot.ts from projects/demo; regenerate after the demo or the project model changes:
 * `npx -y deno@2.9.6 run --allow-read --allow-env test/scenarios/_writeDemoSnapshot.ts > test/scenarios/_demoSnapshot.ts
 * && npx -y deno@2.9.6 fmt test/scenarios/_demoSnapshot.ts`.
 */
import { loadProject } from "../../src/commands/loadProject.ts";
import { DEMO_FOLDER, withoutProvenance } from "./_demoYear.ts";

const model = (await loadProject(DEMO_FOLDER)).model;
if (model === undefined) throw new Error("projects/demo does not resolve");
const scenario = model.scenarios.find((s) => s.kind === "weather");
const data = JSON.stringify(withoutProvenance({ constructions: model.constructions, scenario }));
console.log(`/**
 * Snapshot of the demo project's constructions and weather scenario as resolved by loadProject (projects/demo),
 * without source positions and reference texts (\`at\`, \`weatherAt\`, \`source\`), so the benchmark runs with
 * --allow-read alone (the project reader's YAML parser asks for environment access); the test "the demo snapshot
 * matches projects/demo" fails as soon as the project and this copy differ. Written by _writeDemoSnapshot.ts.
 */

/** The demo's constructions and weather scenario, JSON-equal to loadProject("projects/demo") without provenance. */
export const DEMO_SNAPSHOT = ${data};`);
