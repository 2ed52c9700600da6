/** The approval statement offered to the owner to read (and edit) before signing. */
export function defaultStatement(machineName: string, targetSetName: string): string {
  return [
    `I have reviewed the result of every required check of "${machineName}" listed in this record against the target set "${targetSetName}", together with every waiver and its reason, and I approve the machine as ready to cut.`,
    'This approval records the machine\u2019s alignment and calibration on this date. It does not replace local codes, the equipment makers\u2019 instructions, or a licensed electrician\u2019s work on mains wiring and earthing, and the E-stop and limit switches must still be tested before each day\u2019s work.',
  ].join(' ');
}
