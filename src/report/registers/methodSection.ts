/** The calculation methods section, with the tool's scope, the equations, truncation rules and the limits of every check. */
import { formatSig } from "../page/format.ts";
import { html, raw, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";

const CONVENTIONS = raw(`<h3 id="s-3-1">Conventions of the methods</h3>
<ul>
<li><strong>Air to air</strong>: the outside and inside surface resistances R_se and R_si are included as massless
layers, U = 1/(R_se + ΣR + R_si). Response factors, CTF, periodic response factors, the conduction time series and the
ISO 13786 quantities printed with each construction are air to air. <strong>Surface to surface</strong> (no surface resistances,
U_s) is given in results.json for use in a heat balance.</li>
<li><strong>Sign</strong>: heat flux is positive from outside to inside at every plane; q_o enters the construction at
the outside, q_i leaves it into the room.</li>
<li><strong>Time</strong>: response factors answer a unit triangular temperature pulse (height 1 K, base 2Δ, peak at
t = 0), i.e. boundary temperatures taken as linear between samples; index j is the value at t = jΔ after the peak.</li>
<li><strong>Order</strong>: layers are numbered from outside to inside.</li>
</ul>`);

const MATRICES = raw(`<h3 id="s-3-2">Transmission matrices (Pipes 1957)</h3>
<p>In the Laplace domain (variable s) temperature and flux on the two faces are related by</p>
<p class="equation">[T_o(s), q_o(s)]ᵀ = M(s) · [T_i(s), q_i(s)]ᵀ,&emsp; M = [[A, B], [C, D]].</p>
<p>Massive layer of thickness d, conductivity λ, diffusivity α = λ/(ρc), with γ = √(s/α):</p>
<p class="equation">A = D = cosh(γd),&emsp; B = sinh(γd) / (λγ),&emsp; C = λγ · sinh(γd).</p>
<p>Film or massless layer of resistance R: M = [[1, R], [0, 1]]. Whole construction, outside to inside:</p>
<p class="equation">M = F_se · M_1 · M_2 ⋯ M_n · F_si&emsp;(F: film matrices, left out surface to surface).</p>
<p>Then det M = AD − BC = 1, and at s = 0: A = D = 1, B = R (total), C = 0. Solving for the fluxes:</p>
<p class="equation">q_o = X·T_o − Y·T_i,&emsp; q_i = Y·T_o − Z·T_i,&emsp; X = D/B,&emsp; Y = 1/B,&emsp; Z = A/B.</p>`);

const POLES = raw(`<h3 id="s-3-3">Poles</h3>
<p>The poles of X, Y and Z are the zeros of B(s). They are real, negative and simple: s_n = −β_n with
0 &lt; β_1 &lt; β_2 &lt; …; τ_1 = 1/β_1 is the first time constant. The number of poles below any β is counted exactly by
an oscillation count (the zeros of the temperature of the solution started with T = 0, q = 1 at the outside node and
carried through the layers at s = −β). Each pole is isolated by bisection on that count in √β and refined by Brent's
method on B(−β), so close pairs of poles cannot be missed. Poles are taken up to β_nΔ = 40; the limit is doubled (at most
four times) until the first pole left out would add less than 10⁻¹⁰·U to RF_0.</p>`);

const RESPONSE_FACTORS = raw(
  `<h3 id="s-3-4">Response factors (Stephenson &amp; Mitalas 1967, 1971; Kusuda 1969; Hittle 1981)</h3>
<p>Ramp response of G ∈ {X, Y, Z}, whose numerator is N_G ∈ {D, 1, A}:</p>
<p class="equation">r_G(t) = U·t + G′(0) + Σ_n a_n e^(−β_n t),&emsp; a_n = N_G(−β_n) / (β_n² · B′(−β_n)).</p>
<p>G′(0) is taken from the exact derivatives of the matrix product at s = 0 (per layer A′ = D′ = R_l C_l/2,
B′ = R_l² C_l/6, C′ = C_l, with C_l = ρ c d): X′(0) = (D′R − B′)/R², Y′(0) = −B′/R², Z′(0) = (A′R − B′)/R², R = B(0).
The residue series for the constant term converges slowly and is not used. A triangular pulse is
(1/Δ)[r(t + Δ) − 2r(t) + r(t − Δ)], hence</p>
<p class="equation">RF_0 = r(Δ)/Δ,&emsp; RF_1 = [r(2Δ) − 2r(Δ)]/Δ,&emsp;
RF_j = (1/Δ) Σ_n a_n (1 − e^(−β_nΔ))² e^(−β_n(j−1)Δ)&ensp;(j ≥ 2).</p>
<p>By superposition, for any sampled temperatures:</p>
<p class="equation">q_i(t) = Σ_j Y_j T_o(t − jΔ) − Σ_j Z_j T_i(t − jΔ),&emsp; q_o(t) = Σ_j X_j T_o(t − jΔ) − Σ_j Y_j T_i(t − jΔ).</p>
<p><strong>Truncation</strong>: terms are produced until a bound on the remaining tail is below 10⁻¹⁰·U (at most
2¹⁹ terms; the residual is printed either way). Sum rule:
Σ X_j = Σ Y_j = Σ Z_j = U; the truncation residual r = max |Σ RF_j − U| / U is printed with each construction.</p>`,
);

const CTF = raw(
  `<h3 id="s-3-5">Conduction transfer functions from the poles (Stephenson &amp; Mitalas 1971)</h3>
<p>With q_n = e^(−β_nΔ), the denominator d(z) = Π_n (1 − q_n z⁻¹) = 1 + d_1 z⁻¹ + … + d_N z⁻ᴺ and the numerators
by convolution with the response factors, b_k = Σ_(j=0…k) RF_j d_(k−j) for k = 0 … N+1 (X_n from X, Y_n from Y, Z_n
from Z); Φ_n = −d_n. The recurrence is</p>
<p class="equation">q_i,t = Σ_n Y_n T_o,t−n − Σ_n Z_n T_i,t−n + Σ_(n≥1) Φ_n q_i,t−n.</p>
<p>Poles are added slowest first; the smallest set whose long division b(z)/d(z) reproduces the response factors within
10⁻⁹·U is kept (or the best set found). The polynomial form is accepted only when it passes the resynthesis and
coefficient-size checks (limits in Appendix C.1) and its coefficients are well conditioned (roundoff bound of its steady-state
gain, γ_(2N+5) Π(1 + q_n)/Π(1 − q_n) (1 + Σ|RF_j|/U), at most 10⁻⁴; the identity limit is the larger of 10⁻⁶ and
that bound). Otherwise it is not published (<code>null</code>, with a method note in the checks and findings — a choice of form,
not a failed check) and the modal form is used, one first-order recursion per pole with no polynomial expansion and
hence no loss of significance:</p>
<p class="equation">q_t = RF_0 x_t + RF_1 x_(t−1) + Σ_n c_n q_n s_(n,t),&emsp; s_(n,t) = q_n s_(n,t−1) + x_(t−2),&emsp;
c_n = a_n (1 − q_n)² / Δ.</p>`,
);

const STATE_SPACE = raw(
  `<h3 id="s-3-6">Conduction transfer functions from a state-space model (Seem 1987; Ouyang &amp; Haghighat 1991)</h3>
<p>Each massive layer is divided into cell-centred finite volumes, graded finer towards the two exposed faces; node
capacity ρ c Δx, links through half cells, massless layers and films. With u = [T_o, T_i]ᵀ and y = [q_o, q_i]ᵀ:
dx/dt = A x + B u, y = C x + D u. Discretisation is exact for inputs linear between samples, from one matrix
exponential of the augmented matrix:</p>
<p class="equation">F = e^(AΔ),&emsp; Γ_0 = A⁻¹(F − I)B,&emsp; Γ_1 = A⁻¹(Γ_0/Δ − B),&emsp;
x_(k+1) = F x_k + Γ_0 u_k + Γ_1 (u_(k+1) − u_k).</p>
<p>The model's response factors are compared with the response factors above and the mesh is refined (at most three times, up to about
260 cells) until they agree within 60 % of the limit in Appendix C.1; the CTF follows from the eigenvalues of F as for the poles. The cells per layer are printed with the
coefficients. CTF coefficient sets are not unique: the two methods are compared by their response factors.</p>`,
);

const PERIODIC = raw(
  `<h3 id="s-3-7">Periodic response factors and conduction time series (Spitler, Fisher &amp; Pedersen 1997; Spitler &amp; Fisher 1999; ASHRAE Handbook—Fundamentals, nonresidential cooling and heating load chapter)</h3>
<p>For a 24-hour periodic input sampled hourly (Δ = 1 h, whatever the construction's time step):</p>
<p class="equation">Y_P,j = Σ_(k≥0) Y_(j+24k),&emsp; j = 0 … 23&emsp;(X_P, Z_P likewise);&emsp; CTS c_j = Y_P,j / U,&emsp; Σ c_j = 1.</p>
<p>The sums are evaluated in closed form from the modal form (geometric series, no truncation) and checked against the
folded series. Conduction heat gain for a periodic outside temperature T_e (for example sol-air) and a constant room
temperature T_rc: q_θ = Σ_j Y_P,j (T_e,θ−j − T_rc) = Σ_j c_j U (T_e,θ−j − T_rc).</p>`,
);

const ISO = raw(`<h3 id="s-3-8">ISO 13786:2017 dynamic thermal characteristics</h3>
<p>At s = iω with ω = 2π/T, T = 86 400 s, films included and side 1 = inside, the heat transfer matrix follows from
the transmission matrix as Z = [[Z_11, Z_12], [Z_21, Z_22]] = [[A, −B], [−C, D]]. Then</p>
<p class="equation">Y_12 = −1/Z_12,&emsp; Y_11 = −Z_11/Z_12,&emsp; Y_22 = −Z_22/Z_12,&emsp; f = |Y_12| / U,&emsp;
Δt = (T/2π) · arg Y,&emsp; κ_1 = (T/2π) |(Z_11 − 1)/Z_12|,&emsp; κ_2 = (T/2π) |(Z_22 − 1)/Z_12|.</p>
<p>Time shifts follow the standard's sign: negative is a lag, positive a lead. The time lag φ of Y_12 is found by
following its phase continuously from ω → 0, so lags beyond 12 h are not wrapped; the printed time shift of Y_12 is
−φ. The decrement factor is the standard's |Y_12|/U (air to air), not a ratio of surface temperature amplitudes.</p>`);

function harmonic(): Trusted {
  const x = Math.PI / 24;
  const sinc2 = (Math.sin(x) / x) ** 2;
  return html`<h3 id="s-3-9">Harmonic cross-check</h3>
<p>The first harmonic of the hourly periodic cross factors, H_1 = Σ_j Y_P,j e^(−i2πj/24), must equal Y_12 · sinc²(π/24)
(sinc x = sin x / x; sinc²(π/24) = ${
    formatSig(sinc2, 3)
  }) plus the aliased harmonics 24m + 1 (|m| ≤ 60 are added). This ties the time-domain results (poles to conduction time series above) to
the frequency-domain quantities of ISO 13786 by an independent route.</p>`;
}

/** The methods' appendix title: the last appendix, so the body keeps to results and the letters stay in order. */
export const METHODS_APPENDIX_TITLE = "Appendix G Calculation methods";

/**
 * Renders Appendix G, the calculation methods, opening with `scope` (the tool's scope of the calculation), reading the limit of
 * each check from results.json.
 */
export function renderMethodSection(ctx: RenderContext, scope: Trusted): Trusted {
  return html`<section id="s-3"><h2>${METHODS_APPENDIX_TITLE}</h2>
<p>Each construction's steady state follows ISO 6946:2017 (R = d/λ per layer, surface resistances, U = 1/R). Its
dynamic response, printed after its steady-state output with each construction, is computed from the same layers by the methods
below; the equations are written in plain text, with subscripts after an underscore.</p>
${scope}
${CONVENTIONS}
${MATRICES}
${POLES}
${RESPONSE_FACTORS}
${CTF}
${STATE_SPACE}
${PERIODIC}
${ISO}
${harmonic()}
<h3 id="s-3-10">Checks and their limits</h3>
<p>Every construction is checked for these identities and convergences (${
    String(new Set(ctx.input.results.checks.map((c) => c.id)).size)
  } kinds of check); what each verifies and its limit are listed in <a href="#s-c-1">Appendix C.1</a>, every value in <a href="#s-c-2">Appendix C.2</a>.</p>
</section>`;
}
