import type { ComponentType } from 'react';
import { Box, Tab, Tabs } from '@mui/material';
import { useSearchParams } from 'react-router-dom';
import { DriveCalculator } from './drive-calculator';
import { FlatnessCalculator } from './flatness-calculator';
import { ParallelismCalculator } from './parallelism-calculator';
import { PositioningCalculator } from './positioning-calculator';
import { ScrewSpeedCalculator } from './screw-speed-calculator';
import { SquarenessCalculator } from './squareness-calculator';
import { StraightnessCalculator } from './straightness-calculator';
import { TravelTrialCalculator } from './travel-trial-calculator';

interface CalculatorTab {
  key: string;
  label: string;
  Component: ComponentType;
}

const TABS: CalculatorTab[] = [
  { key: 'straightness', label: 'Straightness', Component: StraightnessCalculator },
  { key: 'parallelism', label: 'Parallelism', Component: ParallelismCalculator },
  { key: 'squareness', label: 'Diagonal check', Component: SquarenessCalculator },
  { key: 'flatness', label: 'Bed grid', Component: FlatnessCalculator },
  { key: 'drive', label: 'Steps per mm', Component: DriveCalculator },
  { key: 'travel-trial', label: 'Travel trial', Component: TravelTrialCalculator },
  { key: 'positioning', label: 'Repeat-and-reverse run', Component: PositioningCalculator },
  { key: 'screw-speed', label: 'Speed check', Component: ScrewSpeedCalculator },
];

/** One tab per calculator; the open tab is kept in the address (?calc=…) so it can be linked. */
export function CalculatorsPanel() {
  const [params, setParams] = useSearchParams();
  const current = TABS.find((t) => t.key === params.get('calc')) ?? TABS[0];
  return (
    <Box>
      <Tabs
        value={current.key}
        onChange={(_, key: string) => setParams({ calc: key }, { replace: true })}
        variant="scrollable"
        scrollButtons="auto"
        aria-label="Calculators"
        sx={{ mb: 2, borderBottom: 1, borderColor: 'divider' }}
      >
        {TABS.map((t) => (
          <Tab
            key={t.key}
            value={t.key}
            label={t.label}
            id={`calc-tab-${t.key}`}
            aria-controls={`calc-panel-${t.key}`}
          />
        ))}
      </Tabs>
      <Box role="tabpanel" id={`calc-panel-${current.key}`} aria-labelledby={`calc-tab-${current.key}`}>
        <current.Component key={current.key} />
      </Box>
    </Box>
  );
}
