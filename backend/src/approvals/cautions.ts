/** The usual cautions printed on the certificate and shown before signing (common practice). */
export const SAFETY_CAUTIONS: { title: string; text: string; plasmaOnly?: boolean }[] = [
  {
    title: 'Electric shock',
    plasmaOnly: true,
    text: 'The plasma circuit runs at a few hundred volts open-circuit: dry gloves, stay insulated from the work, disconnect before service. The work lead is a current return, not an earth.',
  },
  {
    title: 'Arc radiation',
    plasmaOnly: true,
    text: 'Use a filter shade to suit the current (about 5 below 40 A, 6 to 60 A, 8 above); plain safety glasses are not enough.',
  },
  {
    title: 'Fumes',
    plasmaOnly: true,
    text: 'Stainless steel gives hexavalent chromium, galvanised steel zinc oxide: use extraction or ventilation and check the material\u2019s safety data sheet.',
  },
  {
    title: 'Fire',
    plasmaOnly: true,
    text: 'Clear combustibles and keep an extinguisher at hand. On a water table, hydrogen can collect under aluminium being cut.',
  },
  {
    title: 'Moving gantry',
    text: 'Keep clear of pinch points between the gantry and its stops, especially while homing; expect unexpected motion.',
  },
  {
    title: 'Emergency stop',
    text: 'The E-stop must be hardware, stop all motion and the cutting power, and be tested daily, with the limit switches.',
  },
  {
    title: 'Not a substitute',
    text: 'This record does not replace local codes, the equipment makers\u2019 instructions, or a licensed electrician for mains wiring, earthing and bonding.',
  },
];

// A router has no arc; any other machine gets every caution.
export const cautionsFor = (machineKind: string) =>
  SAFETY_CAUTIONS.filter((c) => !c.plasmaOnly || machineKind !== 'router');
