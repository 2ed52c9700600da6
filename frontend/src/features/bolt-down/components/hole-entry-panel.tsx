import { useRef, useState, type FormEvent } from 'react';
import { positionText } from '../utils/position-text';
import { Alert, AlertTitle, Box, Button, Chip, Paper, Stack, TextField, Typography } from '@mui/material';
import CheckOutlined from '@mui/icons-material/CheckOutlined';
import { IndicatorPanel } from '../../../components/indicator-input/indicator-panel';
import { useIndicatorInput } from '../../../components/indicator-input/use-indicator-input';
import { UNIT_LABELS } from '../../../lib/units';
import { palette } from '../../../theme/theme';
import type { RecordHoleInput } from '../api/record-hole';
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
  /** Sends the write (at once, or kept on this device until the connection returns). */
  record: (input: RecordHoleInput) => void;
  /** Called once a hole is fixed (sent or kept waiting), so the guide can move on. */
  onFixed: (index: number) => void;
}

/** The hole being fixed: its aim, the reading as it is typed, and the difference, large. */
// Mounted afresh for each hole (keyed by the guide), so nothing typed at one hole leaks to the next.
export function HoleEntryPanel({ bd, hole, isNext, refusal, record, onFixed }: Props) {
  const [text, setText] = useState(() => refusal?.text ?? loadDraft(bd.id, hole.index));
  const [problem, setProblem] = useState<string | null>(null);
  // A reading outside the band is fixed only by a second, deliberate act: never by Enter alone.
  const [confirming, setConfirming] = useState(false);
  const inputRef = useRef<HTMLInputElement>(null);
  const unit = UNIT_LABELS[bd.readingUnit];
  const typeIn = (t: string) => {
    setText(t);
    saveDraft(bd.id, hole.index, t);
    setProblem(null);
    setConfirming(false);
  };
  // A reading from an indicator fills the field and never fixes the hole: fixing stays the person's act.
  const indicator = useIndicatorInput({
    unit: bd.readingUnit,
    enterMovesOn: false,
    place: (t) => {
      typeIn(t);
      return {
        cell: 'reading',
        label: `${holeName(hole.index).toLowerCase()} at ${positionText(hole.position, bd.lengthUnit)}, not fixed yet`,
        undo: () => typeIn(''),
      };
    },
  });

  const typed = parseReading(text);
  const difference = typed !== null && hole.target !== null ? typed - hole.target : null;
  const within = difference !== null && Math.abs(difference) <= bd.band + 1e-9;

  const send = () => {
    if (typed === null) return;
    record({ index: hole.index, positionMm: hole.position, reading: typed, fixed: true });
    // The entry is kept by the device's queue from here on; the draft is no longer needed.
    saveDraft(bd.id, hole.index, '');
    onFixed(hole.index);
  };

  function fix(e: FormEvent) {
    e.preventDefault();
    if (typed === null) {
      setProblem(
        text.trim()
          ? `“${text}” is not a number: type the indicator reading in ${unit}`
          : `Type the indicator reading in ${unit} first`,
      );
      return;
    }
    if (difference !== null && !within) {
      // Enter (or the Fix button) on a miss only shows the miss; fixing it needs the confirm below.
      setConfirming(true);
      return;
    }
    send();
  }

  const colour = difference === null ? 'text.secondary' : within ? palette.within : palette.brass;
  return (
    <Paper
      ref={indicator.containerRef}
      component="form"
      onSubmit={fix}
      noValidate
      sx={{ p: { xs: 2, md: 3 } }}
      aria-label={`Fixing ${holeName(hole.index)}`}
    >
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', mb: 1 }}>
        <Typography variant="h2" component="h2">
          {holeName(hole.index)}
        </Typography>
        <Typography color="text.secondary">{positionText(hole.position, bd.lengthUnit)} from the rail start</Typography>
        {isNext ? (
          <Chip size="small" color="primary" label="Next in the order" />
        ) : (
          <Chip size="small" variant="outlined" label={`No. ${hole.order + 1} in the order`} />
        )}
        {hole.fixed && (
          <Chip
            size="small"
            color={hole.onTarget === false ? 'warning' : 'success'}
            variant="outlined"
            label={`Fixed at ${signed(hole.reading, bd.readingUnit)}${hole.onTarget === false ? `, ${plain(Math.abs(hole.difference ?? 0), bd.readingUnit)} off its aim` : ''}`}
          />
        )}
      </Stack>
      <IndicatorPanel indicator={indicator} nextLabel="this hole's reading" />

      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' }, gap: 2, alignItems: 'start' }}>
        <Box>
          <Typography color="text.secondary">Aim for</Typography>
          <Typography
            sx={{ fontSize: { xs: '2rem', md: '2.4rem' }, fontWeight: 500, lineHeight: 1.2 }}
            data-testid="aim"
          >
            {hole.target === null ? 'any reading' : signed(hole.target, bd.readingUnit)}
          </Typography>
          <Typography variant="body2" color="text.secondary">
            {hole.target === null
              ? 'The first hole fixed sets the datum the others are aimed at.'
              : `On target within ±${plain(bd.band, bd.readingUnit)}.`}
          </Typography>
          <TextField
            autoFocus
            label={`Reading at ${holeName(hole.index).toLowerCase()} (${unit})`}
            value={text}
            onChange={(e) => typeIn(e.target.value)}
            error={!!problem}
            helperText={
              problem ??
              'Enter fixes the hole when the reading is within the band (a reading sent by an indicator never does)'
            }
            inputRef={inputRef}
            slotProps={{
              htmlInput: {
                inputMode: 'decimal',
                autoComplete: 'off',
                'data-indicator-cell': 'reading',
                style: { fontSize: '1.8rem', padding: '10px 12px' },
              },
            }}
            sx={{ mt: 2, width: '100%', maxWidth: 320 }}
            size="medium"
          />
        </Box>
        <Box
          role="status"
          aria-live="polite"
          aria-label="Difference from the aim"
          sx={{ textAlign: { xs: 'left', sm: 'right' } }}
        >
          <Typography color="text.secondary">Difference from the aim</Typography>
          <Typography
            sx={{
              fontSize: { xs: '3.2rem', md: '4.2rem' },
              fontWeight: 700,
              lineHeight: 1.1,
              color: colour,
              fontVariantNumeric: 'tabular-nums',
            }}
            data-testid="difference"
          >
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

      {confirming && difference !== null && (
        <Alert severity="warning" sx={{ mt: 2 }} role="alert" data-testid="miss-confirm">
          <AlertTitle>
            {holeName(hole.index)} reads {plain(Math.abs(difference), bd.readingUnit)}{' '}
            {difference > 0 ? 'above' : 'below'} its aim
          </AlertTitle>
          The band is ±{plain(bd.band, bd.readingUnit)}, so this is{' '}
          {plain(Math.max(Math.abs(difference) - bd.band, 0), bd.readingUnit)} outside it. Holes fixed after this one
          are aimed from it. Nudge the rail to {signed(hole.target, bd.readingUnit)}, or fix it here on purpose.
          <Stack direction="row" spacing={1} useFlexGap sx={{ mt: 1.5, flexWrap: 'wrap' }}>
            <Button color="warning" variant="contained" onClick={send} sx={{ whiteSpace: 'nowrap' }}>
              Fix it anyway
            </Button>
            <Button
              color="inherit"
              variant="outlined"
              sx={{ whiteSpace: 'nowrap' }}
              onClick={() => {
                setConfirming(false);
                inputRef.current?.focus();
              }}
            >
              Keep nudging
            </Button>
          </Stack>
        </Alert>
      )}
      {refusal && !problem && (
        <Alert severity="error" sx={{ mt: 2 }}>
          The server refused the reading {refusal.text} {unit}: {refusal.message}. Nothing else was changed.
        </Alert>
      )}
      <Button
        type="submit"
        variant="contained"
        size="large"
        startIcon={<CheckOutlined />}
        disabled={confirming}
        sx={{ mt: 2, px: 4, py: 1.25, fontSize: '1.1rem' }}
      >
        Fix {holeName(hole.index).toLowerCase()}
      </Button>
    </Paper>
  );
}
