import { useState } from 'react';
import { Alert, Box, Button, MenuItem, TextField, Typography } from '@mui/material';
import { LINE_FORMATS, type LineFormat } from './parse-reading';
import { serialIndicator, useSerialState } from './serial-indicator';
import { BAUD_RATES, LINE_ENDINGS, type LineEnding } from './web-serial';

const BAUD_KEY = 'railwright.indicator-baud';
const ENDING_KEY = 'railwright.indicator-line-ending';

/** Port, baud, line ending and line format of an indicator on a serial cable (Web Serial). */
export function SerialControls({
  lineFormat,
  onLineFormat,
}: {
  lineFormat: LineFormat;
  onLineFormat: (f: LineFormat) => void;
}) {
  const state = useSerialState();
  const [baud, setBaud] = useState(() => Number(localStorage.getItem(BAUD_KEY)) || 9600);
  const [ending, setEnding] = useState<LineEnding>(
    () => (localStorage.getItem(ENDING_KEY) as LineEnding | null) ?? 'crlf',
  );
  if (state.status === 'unavailable') {
    return (
      <Alert severity="info" icon={false}>
        A serial indicator cannot be connected: not available in this browser (use Chrome or Edge on a computer, or
        keyboard mode).
      </Alert>
    );
  }
  const connected = state.status === 'connected';
  return (
    <Box sx={{ display: 'flex', gap: 1.5, flexWrap: 'wrap', alignItems: 'center' }}>
      <TextField
        select
        label="Baud"
        value={baud}
        disabled={connected}
        onChange={(e) => (setBaud(Number(e.target.value)), localStorage.setItem(BAUD_KEY, e.target.value))}
        sx={{ width: 120 }}
      >
        {BAUD_RATES.map((b) => (
          <MenuItem key={b} value={b}>
            {b}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        select
        label="Line ending"
        value={ending}
        disabled={connected}
        onChange={(e) => (setEnding(e.target.value as LineEnding), localStorage.setItem(ENDING_KEY, e.target.value))}
        sx={{ width: 130 }}
      >
        {(Object.keys(LINE_ENDINGS) as LineEnding[]).map((k) => (
          <MenuItem key={k} value={k}>
            {LINE_ENDINGS[k].label}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        select
        label="Line format"
        value={lineFormat}
        onChange={(e) => onLineFormat(e.target.value as LineFormat)}
        helperText={lineFormat === 'last-number' ? 'Text before the number is skipped' : undefined}
        sx={{ width: { xs: '100%', sm: 230 } }}
      >
        {(Object.keys(LINE_FORMATS) as LineFormat[]).map((k) => (
          <MenuItem key={k} value={k}>
            {LINE_FORMATS[k]}
          </MenuItem>
        ))}
      </TextField>
      {connected ? (
        <Button variant="outlined" onClick={() => void serialIndicator.disconnect()} sx={{ minHeight: 44 }}>
          Disconnect the indicator
        </Button>
      ) : (
        <Button
          variant="contained"
          onClick={() => void serialIndicator.connect(baud, ending)}
          disabled={state.status === 'connecting'}
          sx={{ minHeight: 44 }}
        >
          {state.status === 'connecting' ? 'Choosing a port…' : 'Connect a serial indicator'}
        </Button>
      )}
      {connected && <Typography color="success.main">Connected: each line fills the next empty cell.</Typography>}
      {state.message && (
        <Alert severity={state.status === 'error' ? 'error' : 'info'} sx={{ flex: '1 1 100%' }}>
          {state.message}
        </Alert>
      )}
    </Box>
  );
}
