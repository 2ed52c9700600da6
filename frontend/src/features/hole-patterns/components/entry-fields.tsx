import { Button, IconButton, Stack, TextField } from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import type { PatternDraft } from '../utils/pattern-draft';

type Set = (change: (d: PatternDraft) => PatternDraft) => void;

const num = { inputMode: 'decimal' as const };

const GRID_FIELDS: [keyof PatternDraft['grid'], string][] = [
  ['originX', 'First hole x'],
  ['originY', 'First hole y'],
  ['columns', 'Columns'],
  ['rows', 'Rows'],
  ['pitchX', 'Column pitch'],
  ['pitchY', 'Row pitch'],
  ['diameter', 'Hole diameter'],
];
const CIRCLE_FIELDS: [keyof PatternDraft['circle'], string][] = [
  ['centreX', 'Centre x'],
  ['centreY', 'Centre y'],
  ['circleDiameter', 'Bolt circle diameter'],
  ['count', 'Number of holes'],
  ['startAngleDeg', 'First hole angle (°)'],
  ['diameter', 'Hole diameter'],
];

/** The holes as a list, a grid or a bolt circle, in the pattern's unit. */
export function EntryFields({ draft, set }: { draft: PatternDraft; set: Set }) {
  const unit = draft.unit;
  if (draft.entry === 'grid' || draft.entry === 'circle') {
    const fields = draft.entry === 'grid' ? GRID_FIELDS : CIRCLE_FIELDS;
    const values = draft[draft.entry] as Record<string, string>;
    return (
      <Stack direction="row" useFlexGap spacing={1.5} sx={{ flexWrap: 'wrap' }}>
        {fields.map(([key, label]) => (
          <TextField
            key={key}
            size="small"
            label={['rows', 'columns', 'count', 'startAngleDeg'].includes(key) ? label : `${label} (${unit})`}
            value={values[key]}
            slotProps={{ htmlInput: num }}
            onChange={(e) =>
              set((d) => ({
                ...d,
                [d.entry]: { ...(d[d.entry as 'grid' | 'circle'] as object), [key]: e.target.value },
              }))
            }
            sx={{ width: { xs: '47%', sm: 170 } }}
          />
        ))}
      </Stack>
    );
  }
  return (
    <Stack spacing={1}>
      {draft.holes.map((h, i) => (
        <Stack key={i} direction="row" spacing={1} sx={{ alignItems: 'center' }}>
          {(['x', 'y', 'diameter'] as const).map((k) => (
            <TextField
              key={k}
              size="small"
              label={`${k === 'diameter' ? 'Ø' : k} ${i + 1} (${unit})`}
              value={h[k]}
              slotProps={{ htmlInput: num }}
              onChange={(e) =>
                set((d) => ({ ...d, holes: d.holes.map((o, j) => (j === i ? { ...o, [k]: e.target.value } : o)) }))
              }
            />
          ))}
          <IconButton
            aria-label={`Remove hole ${i + 1}`}
            disabled={draft.holes.length === 1}
            onClick={() => set((d) => ({ ...d, holes: d.holes.filter((_, j) => j !== i) }))}
          >
            <DeleteOutline />
          </IconButton>
        </Stack>
      ))}
      <Button
        startIcon={<AddOutlined />}
        sx={{ alignSelf: 'flex-start' }}
        onClick={() =>
          set((d) => ({ ...d, holes: [...d.holes, { x: '', y: '', diameter: d.holes[d.holes.length - 1].diameter }] }))
        }
      >
        Add hole
      </Button>
    </Stack>
  );
}
