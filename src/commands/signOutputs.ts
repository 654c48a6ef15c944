/** `build --sign`: signs the rendered package.html with the firm's key, at build time. */
import { type Signer, signingTime, signPage } from "../archive/signature.ts";
import type { CommandIo } from "./commandIo.ts";
import type { ProducedOutputs } from "./produce.ts";
import type { OutputFile } from "./writeOutput.ts";

export { readSigner } from "./signingKeys.ts";

/**
 * Returns the output set with package.html signed. The signing time is the one clock reading in a package;
 * it lives only in the signature element, which `verify` removes before comparing with a fresh rendering.
 */
export async function signOutputFiles(
  outputs: ProducedOutputs,
  signer: Signer,
  io: CommandIo,
  now: Date = new Date(),
): Promise<readonly OutputFile[]> {
  const signed = await signPage(outputs.page, signer, now);
  io.stdout(`signed package.html with key ${signer.fingerprint} at ${signingTime(now)}`);
  return outputs.files.map((file) => file.path === "package.html" ? { path: file.path, text: signed } : file);
}
