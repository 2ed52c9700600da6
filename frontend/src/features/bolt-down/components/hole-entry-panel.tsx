import { useState, type FormEvent } from 'react';
import { positionText } from '../utils/position-text';
import { Alert, Box, Button, Chip, Paper, Stack, TextField, Typography } from '@mui/material';
import CheckOutlined from '@mui/icons-material/CheckOutlined';
import { IndicatorPanel } from '../../../components/indicator-input/indicator-panel';
import { useIndicatorInput } from '../../../components/indicator-input/use-indicator-input';
import { ApiError } from '../../../lib/api-client';
import { UNIT_LABELS } from '../../../lib/units';
import { palette } from '../../../theme/theme';
import { useRecordHole } from '../api/record-hole';
import type { BoltDown } from '../types';
import type { GuideHole } from '../utils/guide-state';
import { loadDraft, saveDraft } from '../utils/draft';
import { holeName, parseReading, plain, signed } from '../utils/format';

export interface Refusal {
  index: number;
  text: string;
  message: string;
}

interface Props {
  bd: BoltDown;
  hole: GuideHole;
  isNext: boolean;
  /** The server's refusal of the last reading typed at this hole, to show with it. */
  refusal?: Refusal | null;
  /** Called once a hole is fixed (sent or kept waiting), so the guide can move on. */
  onFixed: (index: number) => void;
  /** Called when the server refuses the reading: the guide comes back to this hole with it. */
  onRefused: (refusal: Refusal) => void;
}

/** The hole being fixed: its aim, the reading as it is typed, and the difference, large. */
// Mounted afresh for each hole (keyed by the guide), so nothing typed at one hole leaks to the next.
export function HoleEntryPanel({ bd, hole, isNext, refusal, onFixed, onRefused }: Props) {
  const [text, setText] = useState(() => refusal?.text ?? loadDraft(bd.id, hole.index));
  const [problem, setProblem] = useState<string | null>(null);
  const record = useRecordHole(bd.id);
  const unit = UNIT_LABELS[bd.readingUnit];
  const typeIn = (t: string) => {
    setText(t);
    saveDraft(bd.id, hole.index, t);
    setProblem(null);
  };
  // A reading from an indicator fills the field and never fixes the hole: fixing stays the person's act.
  const indicator = useIndicatorInput({
    unit: bd.readingUnit,
    enterMovesOn: false,
    place: (t) => {
      typeIn(t);
      return { cell: 'reading', label: `${holeName(hole.index).toLowerCase()} at ${positionText(hole.position, bd.lengthUnit)}, not fixed yet`, undo: () => typeIn('') };
    },
  });

  const typed = parseReading(text);
  const difference = typed !== null && hole.target !== null ? typed - hole.target : null;
  const within = difference !== null && Math.abs(difference) <= bd.band + 1e-9;

  async function fix(e: FormEvent) {
    e.preventDefault();
    if (typed === null) {
      setProblem(text.trim() ? `“${text}” is not a number: type the indicator reading in ${unit}` : `Type the indicator reading in ${unit} first`);
      return;
    }
    try {
      const sending = record.mutateAsync({ index: hole.index, positionMm: hole.position, reading: typed, unit: bd.readingUnit, fixed: true });
      // The write itself is kept by the queue from here on; the draft is no longer needed.
      saveDraft(bd.id, hole.index, '');
      await sending;
      onFixed(hole.index);
    } catch (err) {
      // Refused by the server: back to this hole with what was typed, so it can be corrected.
      onRefused({ index: hole.index, text, message: err instanceof ApiError ? err.details.join('; ') || err.message : String(err) });
    }
  }

  const colour = difference === null ? 'text.secondary' : within ? palette.within : palette.brass;
  return (
    <Paper ref={indicator.containerRef} component="form" onSubmit={fix} noValidate sx={{ p: { xs: 2, md: 3 } }} aria-label={`Fixing ${holeName(hole.index)}`}>
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', mb: 1 }}>
        <Typography variant="h2" component="h2">
          {holeName(hole.index)}
        </Typography>
        <Typography color="text.secondary">{positionText(hole.position, bd.lengthUnit)} from the rail start</Typography>
        {isNext ? <Chip size="small" color="primary" label="Next in the order" /> : <Chip size="small" variant="outlined" label={`No. ${hole.order + 1} in the order`} />}
        {hole.fixed && <Chip size="small" color="success" variant="outlined" label={`Fixed at ${signed(hole.reading, bd.readingUnit)}`} />}
      </Stack>
      <IndicatorPanel indicator={indicator} nextLabel="this hole's reading" />

      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' }, gap: 2, alignItems: 'start' }}>
        <Box>
          <Typography color="text.secondary">Aim for</Typography>
          <Typography sx={{ fontSize: { xs: '2rem', md: '2.4rem' }, fontWeight: 500, lineHeight: 1.2 }} data-testid="aim">
            {hole.target === null ? 'any reading' : signed(hole.target, bd.readingUnit)}
          </Typography>
          <Typography variant="body2" color="text.secondary">
            {hole.target === null ? 'The first hole fixed sets the datum the others are aimed at.' : `On target within ±${plain(bd.band, bd.readingUnit)}.`}
          </Typography>
          <TextField
            autoFocus
            label={`Reading at ${holeName(hole.index).toLowerCase()} (${unit})`}
            value={text}
            onChange={(e) => typeIn(e.target.value)}
            error={!!problem}
            helperText={problem ?? 'Enter fixes the hole (a reading sent by an indicator does not)'}
            slotProps={{ htmlInput: { inputMode: 'decimal', autoComplete: 'off', 'data-indicator-cell': 'reading', style: { fontSize: '1.8rem', padding: '10px 12px' } } }}
            sx={{ mt: 2, width: '100%', maxWidth: 320 }}
            size="medium"
          />
        </Box>
        <Box role="status" aria-live="polite" aria-label="Difference from the aim" sx={{ textAlign: { xs: 'left', sm: 'right' } }}>
          <Typography color="text.secondary">Difference from the aim</Typography>
          <Typography sx={{ fontSize: { xs: '3.2rem', md: '4.2rem' }, fontWeight: 700, lineHeight: 1.1, color: colour, fontVariantNumeric: 'tabular-nums' }} data-testid="difference">
            {difference === null ? (typed === null ? '—' : 'datum') : signed(difference, bd.readingUnit)}
          </Typography>
          <Typography sx={{ color: colour, fontWeight: 500 }}>
            {difference === null
              ? typed === null
                ? 'Type the reading as the rail is nudged'
                : 'This reading becomes the datum'
              : within
                ? `Within ±${plain(bd.band, bd.readingUnit)}: tighten and fix`
                : `Outside ±${plain(bd.band, bd.readingUnit)}: nudge the rail until the dial reads ${signed(hole.target, bd.readingUnit)}`}
          </Typography>
        </Box>
      </Box>

      {refusal && !problem && (
        <Alert severity="error" sx={{ mt: 2 }}>
          The server refused the reading {refusal.text} {unit}: {refusal.message}. Nothing else was changed.
        </Alert>
      )}
      <Button type="submit" variant="contained" size="large" startIcon={<CheckOutlined />} disabled={record.isPending} sx={{ mt: 2, px: 4, py: 1.25, fontSize: '1.1rem' }}>
        Fix {holeName(hole.index).toLowerCase()}
      </Button>
    </Paper>
  );
}
