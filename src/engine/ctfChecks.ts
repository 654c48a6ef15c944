/**
 * The polynomial CTF of each method either is published, with its acceptance figures as check rows, or is not,
 * with the same figures in a method note: the modal form is then used (it always is for the computed fluxes), so a
 * rejected polynomial is a method choice, never a failed check.
 */
import { type EngineCheck, engineCheck, type MethodNote } from "./check.ts";
import {
  CTF_MAX_COEFFICIENT,
  CTF_MAX_IDENTITY_ROUNDOFF,
  CTF_MAX_RESYNTHESIS_ERROR,
  type CtfCandidate,
  ctfRejectionReasons,
} from "./ctf.ts";
import type { RootAnalysis } from "./rootAnalysis.ts";
import type { StateSpaceAnalysis } from "./stateSpaceAnalysis.ts";

/** Check rows of a published CTF, or the method note that stands for them. */
export interface CtfOutcome {
  readonly checks: readonly EngineCheck[];
  readonly notes: readonly MethodNote[];
}

function identityRow(id: string, c: CtfCandidate, method: string): EngineCheck {
  return engineCheck(
    id,
    `max |ΣCTF / (1 − ΣΦ) − U| / U over X, Y, Z${method}; limit max(1e-6, roundoff bound ${
      c.identityRoundoff.toExponential(1)
    } from the coefficients' conditioning)`,
    c.identityError,
    c.identityLimit,
  );
}

function outcome(
  c: CtfCandidate,
  accepted: boolean,
  figures: EngineCheck[],
  noteId: string,
  what: string,
  conditioningId: string,
): CtfOutcome {
  if (accepted) return { checks: figures, notes: [] };
  // Conditioning has no check row of its own: a published CTF meets it through its identity limit.
  const conditioning = engineCheck(
    conditioningId,
    "Roundoff bound of the CTF's steady-state gain from its coefficients' conditioning, relative to U",
    c.identityRoundoff,
    CTF_MAX_IDENTITY_ROUNDOFF,
  );
  const note: MethodNote = {
    id: noteId,
    text: `Method choice: modal form used for ${what}; no polynomial CTF is published because ${
      ctfRejectionReasons(c).join("; ")
    } (best candidate tried: ${c.ctf.Phi.length} poles)`,
    figures: [...figures, conditioning],
  };
  return { checks: [], notes: [note] };
}

/** The root-method CTF of one chain (`suffix` "" air to air, "-surface" surface to surface). */
export function rootCtfOutcome(root: RootAnalysis, suffix: string): CtfOutcome {
  const c = root.ctfCandidate;
  const figures = [
    identityRow(`ctf-identity${suffix}`, c, ""),
    engineCheck(
      `ctf-resynthesis${suffix}`,
      `Root CTF (${c.ctf.Phi.length} poles) long division versus response factors, max error / U`,
      c.resynthesisError,
      CTF_MAX_RESYNTHESIS_ERROR,
    ),
    engineCheck(
      `ctf-coefficient-bound${suffix}`,
      "Largest |CTF coefficient|",
      c.maxAbsCoefficient,
      CTF_MAX_COEFFICIENT,
    ),
  ];
  return outcome(
    c,
    root.ctfAccepted,
    figures,
    `ctf-modal-form${suffix}`,
    `the root method, ${root.boundary}`,
    `ctf-conditioning${suffix}`,
  );
}

/** The state-space CTF (air to air). */
export function stateSpaceCtfOutcome(ss: StateSpaceAnalysis): CtfOutcome {
  const c = ss.ctfCandidate;
  const figures = [
    engineCheck(
      "ctf-state-space-resynthesis",
      `State-space CTF (${c.ctf.Phi.length} poles) long division versus its response factors, max error / U`,
      c.resynthesisError,
      CTF_MAX_RESYNTHESIS_ERROR,
    ),
    engineCheck(
      "ctf-state-space-coefficient-bound",
      "Largest |state-space CTF coefficient|",
      c.maxAbsCoefficient,
      CTF_MAX_COEFFICIENT,
    ),
    identityRow("ctf-state-space-identity", c, " (state space)"),
  ];
  return outcome(
    c,
    ss.ctfAccepted,
    figures,
    "ctf-state-space-modal-form",
    "the state-space method, air-to-air",
    "ctf-state-space-conditioning",
  );
}
