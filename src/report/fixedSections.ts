/** Sections whose text the tool states itself: scope and conventions (1) and cautions (8). */
import { html, raw, type Trusted } from "./html.ts";

/** Section 1: scope, exclusions and the sign and time conventions. */
export function renderScopeSection(): Trusted {
  return html`<section id="s-1"><h2>1 Scope and exclusions</h2>
${
    raw(
      `<p>This package computes the steady-state thermal resistance and transmittance of plane constructions from the
layers given in the input, and their dynamic response: response factors, conduction transfer functions, periodic
response factors, the conduction time series and the ISO 13786 characteristics (method in section 3). The calculation
rests on these simplifications:</p>
<ul>
<li>one-dimensional heat conduction through plane, parallel layers;</li>
<li>constant material properties (no dependence on temperature or moisture content);</li>
<li>no moisture transfer, condensation, latent heat or phase change;</li>
<li>no thermal bridges: linear and point thermal transmittances are not included unless modelled separately and stated in the assumptions register;</li>
<li>surface heat transfer represented by linear surface coefficients (constant surface resistances).</li>
</ul>
<h3 id="s-1-1">1.1 Conventions and symbols</h3>
<table>
<thead><tr><th>Item</th><th>Convention</th></tr></thead>
<tbody>
<tr><td>Heat flow sign</td><td>Positive from outside to inside (a heat gain to the room is positive).</td></tr>
<tr><td>Layer order</td><td>Layers are listed and drawn from outside (left, first) to inside (right, last).</td></tr>
<tr><td>Time</td><td>Hour k is the value at k:00 local standard time (no daylight saving).</td></tr>
<tr><td>R, R_se, R_si</td><td>Thermal resistance, outside and inside surface resistance, m²·K/W.</td></tr>
<tr><td>U</td><td>Thermal transmittance air to air, W/(m²·K), U = 1/R with R including R_se and R_si.</td></tr>
<tr><td>λ, ρ, c</td><td>Thermal conductivity W/(m·K), density kg/m³, specific heat capacity J/(kg·K).</td></tr>
<tr><td>Areal heat capacity</td><td>ρ·c·d of a layer, kJ/(m²·K).</td></tr>
<tr><td>Numbers</td><td>Computed values are printed to three significant figures, response factors and periodic factors to four, CTF coefficients to six, sums checked against U to six; inputs as given (up to four). results.json (Appendix B) holds full precision.</td></tr>
<tr><td>Time shift</td><td>ISO 13786 sign: negative = lag, positive = lead; the time lag is unwrapped and may exceed 12 h.</td></tr>
</tbody>
</table>`,
    )
  }
</section>`;
}

/** Section 8: cautions on the use of the results. */
export function renderCautionsSection(): Trusted {
  return html`<section id="s-8"><h2>8 Cautions</h2>
${
    raw(`<ul>
<li>These results support professional judgment; they do not replace it. The applicable local codes and the
review of a licensed professional govern any design decision.</li>
<li>Errors in heat-transfer inputs can lead to undersized cooling plant, overheating of occupied spaces, or
surface and interstitial condensation. Review the inputs, the assumptions register and the findings before use.</li>
<li>The quality of the inputs bounds the quality of the outputs: material values without a cited source, defaults
and unverified assumptions carry their uncertainty into every result.</li>
<li>The exclusions in section 1 apply. Where an excluded effect matters (thermal bridges, moisture, non-linear
surface exchange), assess it separately.</li>
</ul>`)
  }
</section>`;
}
