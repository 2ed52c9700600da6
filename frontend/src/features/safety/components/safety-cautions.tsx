import { Alert, AlertTitle, Box, Typography } from '@mui/material';

const CAUTIONS: [string, string][] = [
  [
    'Electric shock',
    'the plasma circuit runs at a few hundred volts open-circuit. Dry gloves, stay insulated from the work, and disconnect before service. The work lead returns the cutting current; it is not an earth.',
  ],
  [
    'Arc radiation',
    'look at the arc only through a filter of the right shade for the current (about shade 5 below 40 A, 6 up to 60 A, 8 above); plain safety glasses are not enough.',
  ],
  [
    'Fumes',
    'stainless steel gives off hexavalent chromium and galvanised steel zinc oxide. Cut with extraction or ventilation running and read the material’s safety data sheet.',
  ],
  [
    'Fire and water tables',
    'clear anything that burns and keep an extinguisher at hand. Under aluminium cut over water, hydrogen can collect and ignite.',
  ],
  [
    'Moving gantry',
    'keep hands and bodies clear of the pinch points between gantry, stops and frame, above all while homing, and expect the machine to move unexpectedly.',
  ],
  ['Emergency stop', 'a hardware stop that halts all motion and the cutting power, tested every day before work.'],
];

/** The usual cautions for plasma cutting and moving gantries, and what the walk is not. */
export function SafetyCautions() {
  return (
    <Alert severity="warning" icon={false} sx={{ '& .MuiAlert-message': { width: '100%' } }}>
      <AlertTitle>Before anyone cuts</AlertTitle>
      <Box component="ul" sx={{ m: 0, pl: 2.5, display: 'grid', gap: 0.5 }}>
        {CAUTIONS.map(([title, text]) => (
          <li key={title}>
            <strong>{title}:</strong> {text}
          </li>
        ))}
      </Box>
      <Typography sx={{ mt: 1.25, fontWeight: 500 }}>
        This walk records what was checked and by whom. It does not replace local codes, the equipment makers’
        instructions, or licensed practice: mains wiring, earthing and bonding are for a licensed electrician.
      </Typography>
    </Alert>
  );
}
