import { loadProject } from "../../src/commands/loadProject.ts";
const l = await loadProject(Deno.args[0]!);
const m = l.model!;
for (const x of m.materials) console.log("mat", x.id, x.materialClass, JSON.stringify(x.at));
for (const c of m.constructions) { console.log("con", c.id, JSON.stringify(c.at)); for (const y of c.layers) console.log("  ", y.name, y.materialId, JSON.stringify(y.at)); }
for (const s of m.scenarios) { console.log("scn", s.id, JSON.stringify(s.at)); for (const y of s.surfaces) console.log("  ", y.id, JSON.stringify(y.at)); }
for (const a of m.assumptions) console.log("asm", a.id, a.at);
for (const d of m.documents) for (const s of d.segments) console.log("seg", d.path, s.kind, JSON.stringify(s.at), s.kind==="block"? s.id : s.markdown.slice(0,40).replace(/\n/g," "));
