/**
 * Something a person should know about a result that does not change its number: too few runs
 * for ISO 230-2's rules, an instrument coarser than a quarter of the tolerance, a correction far
 * from the theoretical value. Every computed result carries a list of these, and they travel with
 * it to the readiness board, the approval snapshot and the certificate.
 */
export interface ResultWarning {
  /** Stable, kebab-case: "few-runs", "coarse-instrument", "correction-far-from-theory". */
  code: string;
  /** One plain sentence with its numbers and units, as shown to people. */
  message: string;
}
