import { useMemo } from 'react';
import { Box, Chip, TextField, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { palette } from '../../../theme/theme';
import { ANSWER_LABELS, type SafetyAnswer, type WalkItem } from '../types';
import { formatDateTime } from '../../../lib/format-time';

const COLOURS: Record<SafetyAnswer, string> = { yes: palette.within, no: palette.outside, na: palette.notStarted };

/** The note typed for one item; any text, trimmed by the walk when it is saved. */
const safetyNoteFormSchema = z.object({ note: z.string() });

type SafetyNoteFormValues = z.input<typeof safetyNoteFormSchema>;

/** One item of the walk: its answer (yes / no / not applicable), a note, who answered and when. */
export function SafetyItemRow({
  item,
  canAnswer,
  busy,
  onAnswer,
}: {
  item: WalkItem;
  canAnswer: boolean;
  busy: boolean;
  onAnswer: (answer: SafetyAnswer, note: string) => void;
}) {
  const a = item.answer;
  const savedNote = a?.note ?? '';
  // A newly saved note replaces what is typed: the form follows `values` whenever the saved note changes.
  const saved = useMemo<SafetyNoteFormValues>(() => ({ note: savedNote }), [savedNote]);
  const form = useForm<SafetyNoteFormValues>({ values: saved, resolver: zodResolver(safetyNoteFormSchema) });
  // An answer goes with the note as typed; leaving the note saves it with the answer already given, if it changed.
  const answerWith = (answer: SafetyAnswer) => form.handleSubmit(({ note }) => onAnswer(answer, note))();
  const saveNote = form.handleSubmit(({ note }) => a && note.trim() !== a.note && onAnswer(a.answer, note));
  const isNo = a?.answer === 'no';

  return (
    <Box
      role="group"
      aria-label={item.text}
      sx={{
        py: 1.5,
        px: 1.5,
        borderLeft: '4px solid',
        borderColor: a ? COLOURS[a.answer] : '#d8d3c7',
        bgcolor: isNo ? 'rgba(179, 38, 30, 0.06)' : 'transparent',
        borderRadius: '0 4px 4px 0',
      }}
    >
      <Box sx={{ display: 'flex', gap: 2, flexWrap: 'wrap', alignItems: 'flex-start' }}>
        <Box sx={{ flex: '1 1 300px', minWidth: 0 }}>
          <Typography>
            {item.text}
            {!item.builtIn && <Chip size="small" label="Workshop item" variant="outlined" sx={{ ml: 1, height: 20 }} />}
          </Typography>
          <Typography variant="body2" color="text.secondary" sx={{ mt: 0.25 }}>
            {a
              ? `${ANSWER_LABELS[a.answer]} · ${a.answeredBy.name} · ${formatDateTime(a.answeredAt)}`
              : 'Not answered yet'}
          </Typography>
          {isNo && (
            <Chip
              size="small"
              label="Blocks approval"
              sx={{ mt: 0.5, bgcolor: palette.outside, color: '#fff', fontWeight: 600 }}
            />
          )}
        </Box>
        <ToggleButtonGroup
          exclusive
          size="small"
          value={a?.answer ?? null}
          disabled={!canAnswer || busy}
          onChange={(_, v: SafetyAnswer | null) => {
            if (v) void answerWith(v);
          }}
          aria-label="Answer"
        >
          {(['yes', 'no', 'na'] as const).map((v) => (
            <ToggleButton
              key={v}
              value={v}
              sx={{
                px: 1.5,
                '&.Mui-selected': { bgcolor: COLOURS[v], color: '#fff', '&:hover': { bgcolor: COLOURS[v] } },
              }}
            >
              {ANSWER_LABELS[v]}
            </ToggleButton>
          ))}
        </ToggleButtonGroup>
      </Box>
      {!canAnswer && a?.note && (
        <Typography variant="body2" sx={{ mt: 0.75 }}>
          <Box component="span" sx={{ color: 'text.secondary' }}>
            Note:{' '}
          </Box>
          {a.note}
        </Typography>
      )}
      {canAnswer && (
        <Controller
          name="note"
          control={form.control}
          render={({ field }) => (
            <TextField
              label="Note"
              name={field.name}
              value={field.value}
              onChange={(e) => field.onChange(e.target.value)}
              onBlur={() => {
                field.onBlur();
                void saveNote();
              }}
              inputRef={field.ref}
              disabled={!canAnswer || busy}
              fullWidth
              sx={{ mt: 1 }}
              helperText={canAnswer && !a ? 'Saved with the answer' : undefined}
            />
          )}
        />
      )}
    </Box>
  );
}
