import { Button, IconButton, Stack } from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import { useFieldArray, useWatch, type UseFormReturn } from 'react-hook-form';
import { FormTextField } from '../../../components/form/form-text-field';
import type { PatternDraft } from '../utils/pattern-draft';

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
/** Counts and angles have no length unit. */
const UNITLESS = ['rows', 'columns', 'count', 'startAngleDeg'];

/** The holes as a list, a grid or a bolt circle, in the pattern's unit. */
export function EntryFields({ form }: { form: UseFormReturn<PatternDraft> }) {
  const [unit, entry] = useWatch({ control: form.control, name: ['unit', 'entry'] });
  const holes = useFieldArray({ control: form.control, name: 'holes' });
  if (entry === 'grid' || entry === 'circle') {
    const fields =
      entry === 'grid'
        ? GRID_FIELDS.map(([key, label]) => [`grid.${key}` as const, key, label] as const)
        : CIRCLE_FIELDS.map(([key, label]) => [`circle.${key}` as const, key, label] as const);
    return (
      <Stack direction="row" useFlexGap spacing={1.5} sx={{ flexWrap: 'wrap' }}>
        {fields.map(([name, key, label]) => (
          <FormTextField
            key={name}
            form={form}
            name={name}
            size="small"
            label={UNITLESS.includes(key) ? label : `${label} (${unit})`}
            slotProps={{ htmlInput: num }}
            sx={{ width: { xs: '47%', sm: 170 } }}
          />
        ))}
      </Stack>
    );
  }
  return (
    <Stack spacing={1}>
      {holes.fields.map((h, i) => (
        <Stack key={h.id} direction="row" spacing={1} sx={{ alignItems: 'center' }}>
          {(['x', 'y', 'diameter'] as const).map((k) => (
            <FormTextField
              key={k}
              form={form}
              name={`holes.${i}.${k}`}
              size="small"
              label={`${k === 'diameter' ? 'Ø' : k} ${i + 1} (${unit})`}
              slotProps={{ htmlInput: num }}
            />
          ))}
          <IconButton
            aria-label={`Remove hole ${i + 1}`}
            disabled={holes.fields.length === 1}
            onClick={() => holes.remove(i)}
          >
            <DeleteOutline />
          </IconButton>
        </Stack>
      ))}
      <Button
        startIcon={<AddOutlined />}
        sx={{ alignSelf: 'flex-start' }}
        onClick={() =>
          // The new hole takes the last one’s diameter; the focus stays on the button to add the next.
          holes.append(
            { x: '', y: '', diameter: form.getValues(`holes.${holes.fields.length - 1}.diameter`) },
            { shouldFocus: false },
          )
        }
      >
        Add hole
      </Button>
    </Stack>
  );
}
