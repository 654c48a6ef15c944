/**
 * The tool's own statement of what it computes and what it leaves out ("Scope of the calculation"), with the
 * conventions and units, printed at the head of the calculation methods: the user's scope stays the only scope
 * section of the package.
 */
import { type DisplayUnits, unitLabel } from "../page/displayUnits.ts";
import { escapeHtml, html, joinHtml, raw, type Trusted } from "../page/html.ts";

/** Rows of the conventions table that only an IP package has: the unit system and the temperature scales. */
const IP_ROWS = raw(
  `<tr><td>Units</td><td>Inch-pound (IP), as the front matter asks (<code>units: IP</code>). results.json (Appendix B) and the CSV files are in SI whatever the display; U, R and the peak heat gain also show their SI value in parentheses. Input blocks are echoed as written.</td></tr>
<tr class="unit-definitions"><td>Conversions</td><td>Exact definitions: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lb = 0.45359237 kg (international yard and pound, 1959); 1 Btu = 1055.05585262 J (International Table Btu, NIST SP 811 Appendix B); 1 h = 3600 s. Hence 1 W/(m²·K) = 0.176110 Btu/(h·ft²·°F) and 1 W = 3.41214 Btu/h.</td></tr>
<tr class="unit-definitions"><td>°F, Δ°F</td><td>Temperatures in °F (°F = °C × 1.8 + 32); temperature differences in Δ°F (1 K = 1.8 Δ°F, no offset).</td></tr>
`,
);

function conventionRow(item: string, convention: string): Trusted {
  return raw(`<tr><td>${escapeHtml(item)}</td><td>${escapeHtml(convention)}</td></tr>`);
}

/** The conventions rows that name units, each on its own line as the SI package has always printed them. */
function unitRows(d: DisplayUnits): Trusted {
  const u = (kind: Parameters<typeof unitLabel>[1]) => unitLabel(d, kind);
  const rows = [
    conventionRow(
      "R, R_se, R_si",
      `Thermal resistance, outside and inside surface resistance, ${u("resistance")}.`,
    ),
    conventionRow(
      "U",
      `Thermal transmittance air to air, ${u("transmittance")}, U = 1/R with R including R_se and R_si.`,
    ),
    conventionRow(
      "λ, ρ, c",
      `Thermal conductivity ${u("conductivity")}, density ${u("density")}, specific heat capacity ${
        u("specificHeat")
      }.`,
    ),
    conventionRow(
      "ρ·c·d",
      `Heat capacity per area of a layer (its total Σ ρ·c·d in the layer table), ${
        u("arealHeatCapacity")
      }; not the ISO 13786 areal heat capacity κ, which is given with the dynamic characteristics.`,
    ),
  ];
  return joinHtml([...rows, raw("")], raw("\n"));
}

/** "Scope of the calculation": what the tool covers and excludes, the sign and time conventions, the display units. */
export function renderScopeSection(d: DisplayUnits): Trusted {
  return html`<section id="s-1" class="calculation-scope"><h3>Scope of the calculation</h3>
${
    raw(
      `<p>This package computes the steady-state thermal resistance and transmittance of plane constructions from the
layers given in the input, and their dynamic response: response factors, conduction transfer functions, periodic
response factors, the conduction time series and the ISO 13786 characteristics (methods below). These are the tool's
limits, whatever the project's own scope says; the calculation rests on these simplifications:</p>
<ul>
<li>one-dimensional heat conduction through plane, parallel layers;</li>
<li>constant material properties (no dependence on temperature or moisture content);</li>
<li>no moisture transfer, condensation, latent heat or phase change;</li>
<li>no thermal bridges: linear and point thermal transmittances are not included unless modelled separately and stated in the assumptions register;</li>
<li>surface heat transfer represented by linear surface coefficients (constant surface resistances).</li>
</ul>
<h3 id="s-1-1">Conventions and symbols</h3>
<table>
<thead><tr><th>Item</th><th>Convention</th></tr></thead>
<tbody>
<tr><td>Heat flow sign</td><td>Positive from outside to inside (a heat gain to the room is positive).</td></tr>
<tr><td>Layer order</td><td>Layers are listed from outside (first) to inside (last) and drawn so: walls from left to right, roofs and floors from top to bottom.</td></tr>
<tr><td>Time</td><td>Hour k is the value at k:00 local standard time (no daylight saving).</td></tr>
`,
    )
  }${d.system === "SI" ? html`` : IP_ROWS}${unitRows(d)}${
    raw(
      `<tr><td>Numbers</td><td>Computed values are printed to three significant figures, response factors and periodic factors to four, CTF coefficients to six, sums checked against U to six; inputs as given (up to four). results.json (Appendix B) holds full precision.</td></tr>
<tr><td>Time shift</td><td>ISO 13786 sign: negative = lag, positive = lead; the time lag is unwrapped and may exceed 12 h.</td></tr>
</tbody>
</table>`,
    )
  }
</section>`;
}
