/** Sections 5 and 7: the assumptions register and the sources (section 6: materialSources.ts). */
import { type AssumptionGroup, groupAssumptions } from "./assumptionGroups.ts";
import { html, type Trusted } from "../page/html.ts";
import { FOLDED_RULE } from "../page/findingCounts.ts";
import { quotedNumbers } from "../page/quotedText.ts";
import type { RenderContext } from "../page/packageInput.ts";
import { citedSources, sourceReference } from "./materialSources.ts";

export { renderMaterialsSection, usedMaterials } from "./materialSources.ts";

/** "file:line:col" split into the file and the rest; a position without a file stays whole. */
function splitAt(at: string): [string, string] {
  const m = /^(.*?):(\d+(?::\d+)?)$/.exec(at);
  return m === null ? ["", at] : [m[1]!, m[2]!];
}

/**
 * Positions "line:col" written compactly: consecutive lines at one column as a range, "73–77:5"; others as
 * they are, in their order.
 */
export function lineRanges(positions: readonly string[]): string {
  const out: string[] = [];
  let run: { first: number; last: number; col: string } | undefined;
  const flush = () => {
    if (run === undefined) return;
    out.push(run.first === run.last ? `${run.first}:${run.col}` : `${run.first}\u2013${run.last}:${run.col}`);
    run = undefined;
  };
  for (const p of positions) {
    const m = /^(\d+):(\d+)$/.exec(p);
    if (m === null) {
      flush();
      out.push(p);
      continue;
    }
    const line = Number(m[1]);
    if (run !== undefined && run.col === m[2] && line === run.last + 1) run.last = line;
    else {
      flush();
      run = { first: line, last: line, col: m[2]! };
    }
  }
  flush();
  return out.join(", ");
}

/**
 * The subjects a row applies to, compactly: members that share a scenario (the part before "/") and a file are
 * listed together, "july-design-day: ew1-south, ew1-west (40-scenarios.md 73:5, 74:5)"; every subject and
 * position stays.
 */
function appliesTo(group: AssumptionGroup): Trusted {
  const subjectOf = (id: string) => id.slice(group.kind.length + 1);
  if (group.members.length === 1) {
    return html`<td class="applies-to"><code>${group.members[0]!.at}</code></td>`;
  }
  const parts = new Map<string, { owner: string; file: string; names: string[]; lines: string[] }>();
  for (const m of group.members) {
    const subject = subjectOf(m.id);
    const cut = subject.indexOf("/");
    const owner = cut < 0 ? "" : subject.slice(0, cut);
    const name = cut < 0 ? subject : subject.slice(cut + 1);
    const [file, line] = splitAt(m.at);
    const key = JSON.stringify([owner, file]);
    const part = parts.get(key) ?? { owner, file, names: [], lines: [] };
    part.names.push(name);
    part.lines.push(line);
    parts.set(key, part);
  }
  const items = [...parts.values()].map((p, i) =>
    html`${i === 0 ? "" : "; "}${p.owner === "" ? "" : `${p.owner}: `}${p.names.join(", ")} (<code>${
      p.file === "" ? "" : `${p.file} `
    }${lineRanges(p.lines)}</code>)`
  );
  return html`<td class="applies-to">${String(group.members.length)}: ${items}</td>`;
}

/**
 * The rows of library materials folded into one: each material's values and source are its line in section 6,
 * so the register names the choice once and lists every material with the line that uses it.
 */
function foldLibraryMaterials(groups: readonly AssumptionGroup[]): AssumptionGroup[] {
  const library = groups.filter((g) => g.kind === "library:material");
  if (library.length < 2) return [...groups];
  const folded: AssumptionGroup = {
    kind: "library:material",
    text:
      "Material taken from the built-in library (no project block defines it); its values λ, ρ, c and its source are its line in Materials and their sources",
    source:
      "the built-in library's source of each material (Materials and their sources; numbered in Sources)",
    members: library.flatMap((g) => g.members),
  };
  const first = groups.indexOf(library[0]!);
  return [
    ...groups.slice(0, first),
    folded,
    ...groups.slice(first).filter((g) => g.kind !== "library:material"),
  ];
}

/** The basis column: a library material's source as its number in 7.2, other sources as written. */
function basisCell(group: AssumptionGroup, sources: readonly string[]): Trusted {
  const ref = group.kind === "library:material" ? sourceReference(sources, group.source) : undefined;
  return ref === undefined
    ? html`<td>${group.source}</td>`
    : html`<td>source <a href="#s-7-2">${ref}</a> of the material data sources</td>`;
}

/**
 * Renders section 5: one row per kind of assumption and statement, with the subjects and input lines it
 * applies to; the review's "Default in use" notes are folded into it.
 */
export function renderAssumptionsSection(ctx: RenderContext): Trusted {
  const list = ctx.input.results.assumptions;
  const groups = foldLibraryMaterials(groupAssumptions(list, ctx.input.model.constructions.map((c) => c.id)));
  const sources = citedSources(ctx);
  const body = list.length === 0 ? html`<p>No assumptions were recorded.</p>` : html`
    <table class="assumptions">
      <thead>
        <tr>
          <th>Kind</th>
          <th>Statement</th>
          <th>Basis / source</th>
          <th>Applies to</th>
        </tr>
      </thead>
      <tbody>${groups.map((g) =>
        html`
          <tr>
            <td><code>${g.members.length === 1 ? g.members[0]!.id : g.kind}</code></td>
            <td>${quotedNumbers(g.text, ctx.display)}</td>
            ${basisCell(g, sources)}
            ${appliesTo(g)}
          </tr>
        `
      )}</tbody>
    </table>
  `;
  const siNote = ctx.display.system === "SI" ? html`` : html`
    <p
      class="muted">The statements are quoted from results.json with their values in IP units; a formula keeps its SI form.</p>
  `;
  const defaults = ctx.input.findings.filter((f) => f.rule === FOLDED_RULE).length;
  const folded = defaults === 0 ? html`` : html`
    <p
      class="muted">The review's ${String(
        defaults,
      )} notes "Default in use" are folded into this register: state the value in the input if a default does not fit an element.</p>
  `;
  return html`<section id="s-5"><h2>Assumptions register</h2>
<p>Every value the tool filled in or chose, with its basis and the input lines it applies to; a default used by many subjects is one row (${
    String(list.length)
  } assumptions in ${String(groups.length)} rows; each id in results.json <code>assumptions</code>).</p>
${siNote}${folded}${body}
</section>`;
}

/** Renders section 7: the standards the tool applied and the distinct material sources. */
export function renderSourcesSection(ctx: RenderContext): Trusted {
  const sources = citedSources(ctx);
  const list = sources.length === 0
    ? html`<p class="fail">No material source is cited in the inputs.</p>`
    : html`<ol>${sources.map((s) => html`<li>${s}</li>`)}</ol>`;
  return html`<section id="s-7"><h2>Sources</h2>
<h3 id="s-7-1">Standards and methods applied by the tool</h3>
<ul>
<li>ISO 6946:2017, Building components and building elements: Thermal resistance and thermal transmittance: calculation methods. Used for the thermal resistance of homogeneous layers (R = d/λ), the default surface resistances by direction of heat flow, and the total resistance and U-value.</li>
<li>ISO 13786:2017, Thermal performance of building components: Dynamic thermal characteristics: Calculation methods. Used for the heat transfer matrix at 24 h and the periodic thermal transmittance, decrement factor, time shifts, admittances and areal heat capacities (3.8).</li>
<li>Pipes, L.A. (1957). Matrix analysis of heat transfer problems. Journal of the Franklin Institute 263. Transmission matrices of layers (3.2).</li>
<li>Stephenson, D.G., Mitalas, G.P. (1967). Cooling load calculations by thermal response factor method. ASHRAE Transactions 73(1). Response factors (3.4).</li>
<li>Kusuda, T. (1969). Thermal response factors for multi-layer structures of various heat conduction systems. ASHRAE Transactions 75(1). Response factors of multilayer constructions (3.4).</li>
<li>Stephenson, D.G., Mitalas, G.P. (1971). Calculation of heat conduction transfer functions for multi-layer slabs. ASHRAE Transactions 77(2). Poles, residues and CTF by the z-transform (3.3 to 3.5).</li>
<li>Hittle, D.C. (1981). Calculating building heating and cooling loads using the frequency response of multilayered slabs. US Army CERL Technical Manuscript E-169. Poles, residues and response factors (3.3, 3.4).</li>
<li>Seem, J.E. (1987). Modeling of heat transfer in buildings. PhD thesis, University of Wisconsin–Madison. State-space CTF (3.6).</li>
<li>Ouyang, K., Haghighat, F. (1991). A procedure for calculating thermal response factors of multi-layer walls: state space method. Building and Environment 26. State-space response factors (3.6).</li>
<li>Spitler, J.D., Fisher, D.E., Pedersen, C.O. (1997). The radiant time series cooling load calculation procedure. ASHRAE Transactions 103(2). Conduction time series (3.7).</li>
<li>Spitler, J.D., Fisher, D.E. (1999). Development of periodic response factors for use with the radiant time series method. ASHRAE Transactions 105(2). Periodic response factors (3.7).</li>
<li>ASHRAE Handbook—Fundamentals, chapter on nonresidential cooling and heating load calculations. Periodic response factors and conduction time series (3.7).</li>
</ul>
<h3 id="s-7-2">Material data sources cited in the inputs</h3>
${list}
</section>`;
}
