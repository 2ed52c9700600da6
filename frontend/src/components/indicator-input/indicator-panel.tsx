import { memo, useState } from 'react';
import { Box, Button, Collapse, FormControlLabel, Stack, Switch, Typography } from '@mui/material';
import { ArrivalCard } from './arrival-card';
import { SerialControls } from './serial-controls';
import { useSerialState } from './serial-indicator';
import type { IndicatorInput } from './use-indicator-input';

/**
 * Above a grid: "From an indicator" (listen for a USB indicator's readings anywhere on the page),
 * the serial cable settings, and the reading just arrived with its Undo.
 */
export const IndicatorPanel = memo(function IndicatorPanel({
  indicator,
  nextLabel = 'the next empty cell',
}: {
  indicator: IndicatorInput;
  nextLabel?: string;
}) {
  const serial = useSerialState();
  const [serialOpen, setSerialOpen] = useState(serial.status === 'connected');
  return (
    <Stack component="section" aria-label="Indicator input" spacing={1.25} sx={{ my: 1.5 }}>
      <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap', alignItems: 'center' }}>
        <FormControlLabel
          control={<Switch checked={indicator.capture} onChange={(e) => indicator.setCapture(e.target.checked)} />}
          label="From an indicator"
          sx={{ minHeight: 44, mr: 1 }}
        />
        <Button onClick={() => setSerialOpen((o) => !o)} aria-expanded={serialOpen} sx={{ minHeight: 44 }}>
          {serial.status === 'connected' ? 'Serial indicator connected' : 'Serial cable…'}
        </Button>
      </Box>
      {indicator.capture && (
        <Typography variant="body2" color="text.secondary">
          Listening: a reading sent by a USB indicator in keyboard mode fills {nextLabel}, even with no field selected.
        </Typography>
      )}
      <Collapse in={serialOpen} unmountOnExit>
        <SerialControls lineFormat={indicator.lineFormat} onLineFormat={indicator.setLineFormat} />
      </Collapse>
      <ArrivalCard last={indicator.last} refused={indicator.refused} onUndo={indicator.undo} />
    </Stack>
  );
});
