import { DEFAULT_CONVECTION, DEFAULT_RADIANT_SPLIT, type RadiantSplit, type RoomInput } from "./roomInput.ts";

/** One method choice of the room computation, printed in the package with its source. */
export interface RoomNote {
  readonly id: string;
  readonly text: string;
}

const fixed = (v: number, d = 2) => v.toFixed(d);

/** The heat balance method's choices, with the values this room used. */
export function heatBalanceNotes(room: RoomInput, radiation: number): RoomNote[] {
  const emissivity = room.options?.emissivity ?? 0.9;
  const meanK = room.options?.radiationMeanK ?? 293.15;
  return [
    {
      id: "heat-balance-method",
      text:
        "Inside-face heat balance of every surface and window at every step, the room air held at the set point " +
        "(heat balance method: Pedersen, Fisher & Spitler 1997, from memory); the sensible cooling load is the " +
        "convection from all inside surfaces into the air plus the convective part of the gains, ventilation " +
        "ρ·c·V̇·(θ_e − θ_i) and thermal bridges H_ψ·(θ_e − θ_i), all to the outdoor air.",
    },
    {
      id: "heat-balance-conduction",
      text:
        "Conduction from each surface's far side (outside film included, sol-air for outdoor surfaces with the " +
        "summer film) to its inside surface (no inside film) by 24-hour periodic response factors summed in closed " +
        "form from the construction's poles; exact for temperatures linear between steps. A same-as-room surface " +
        "has an adiabatic far face: it stores heat and passes none.",
    },
    {
      id: "heat-balance-convection",
      text:
        `Inside convection h_c (ISO 6946:2017 Annex C, from memory): walls ${DEFAULT_CONVECTION.wall} W/(m² K) ` +
        `(horizontal flow); ceilings ${DEFAULT_CONVECTION.ceiling} W/(m² K) (downward flow: on a cooling design day a ` +
        `ceiling is taken warmer than the air); floors ${DEFAULT_CONVECTION.floor} W/(m² K) (upward flow: a floor warmed ` +
        "by the sun and the radiant gains gives heat up to the air); a value given for a surface replaces these.",
    },
    {
      id: "heat-balance-long-wave",
      text: `Long-wave exchange between inside surfaces linearised: h_r = ε·4σT_m³ = ${fixed(radiation)} ` +
        `W/(m² K) (ε = ${emissivity}, T_m = ${
          fixed(meanK)
        } K; ISO 6946:2017 Annex C, from memory) with view ` +
        "factors F_ij = A_j/ΣA (area weighted; reciprocal, so the exchange sums to zero): each surface exchanges " +
        "h_r·(θ_s − θ_mrt) with the area-weighted mean radiant temperature.",
    },
    {
      id: "heat-balance-radiant-gains",
      text:
        "Radiant part of internal gains absorbed on all inside surfaces (windows included) by area; transmitted " +
        "solar absorbed on the floor surfaces by area (on all surfaces by area if the room has no floor), none " +
        "reflected back out (conservative, common practice, no source).",
    },
    {
      id: "heat-balance-windows",
      text:
        "Windows massless: conduction from the outdoor air to the inside surface by 1/(1/U_w − R_si) with " +
        "R_si = 1/(h_c + h_r) of their orientation; their inside surface temperature is part of the balance.",
    },
    {
      id: "heat-balance-periodic",
      text:
        "Steady-periodic day solved directly (no repeated days): the balance is linear and repeats daily, so " +
        "the discrete Fourier transform over the day gives one small system per harmonic, solved exactly " +
        "(diagonal plus the rank-one long-wave term, Sherman–Morrison); every flow is then recomputed in the time " +
        "domain and each surface's and the room's energy balance checked at every step.",
    },
    {
      id: "heat-balance-split",
      text:
        "Load split by source: each source run alone through the same balance (temperatures taken relative " +
        "to the set point); the system is linear, so the parts sum to the total (checked).",
    },
  ];
}

/** The radiant time series method's choices. */
export function rtsNotes(split: RadiantSplit): RoomNote[] {
  const same = split.wallOrFloor === DEFAULT_RADIANT_SPLIT.wallOrFloor &&
    split.ceiling === DEFAULT_RADIANT_SPLIT.ceiling && split.window === DEFAULT_RADIANT_SPLIT.window;
  return [
    {
      id: "rts-generation",
      text:
        "The room's own radiant time series: a periodic unit radiant pulse (1 W at the first hour of every " +
        "day) through the same heat balance at hourly steps with every temperature zero; non-solar spread over " +
        "all inside surfaces by area, solar onto the floor; the hourly convective loads divided by their sum " +
        "(ASHRAE Handbook—Fundamentals, nonresidential cooling load chapter, generation procedure; from memory).",
    },
    {
      id: "rts-method",
      text:
        "Radiant time series method load: conduction heat gain of each surface by its air-to-air periodic " +
        "response (conduction time series, R_si included) against the set point; window conduction U·A·Δθ; " +
        `radiant fractions of conduction: walls and floors ${split.wallOrFloor}, roofs and ceilings ` +
        `${split.ceiling}, windows ${split.window}` +
        (same
          ? " (ASHRAE Handbook—Fundamentals, RTS radiant/convective split table, from memory)"
          : " (given)") +
        "; radiant conduction and gains through the non-solar series, transmitted solar through the solar series; " +
        "ventilation, thermal bridges and convective gains instantaneous; same-as-room surfaces conduct nothing (their " +
        "storage is in the series). Sub-hourly inputs are sampled at whole hours. The method counts all radiant heat " +
        "as load (each series sums to 1) while the room conducts part of it out (the retained share printed with the " +
        "series), so it reads higher than the heat balance.",
    },
  ];
}
