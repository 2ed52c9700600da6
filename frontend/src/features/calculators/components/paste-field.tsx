import { Box, TextField, Typography } from '@mui/material';

/**
 * A text box for columns copied from a spreadsheet (tab separated) or typed one row per line.
 * Lines that could not be read are listed under it, by line number.
 */
export function PasteField({
  label,
  value,
  onChange,
  columnsHint,
  placeholder,
  errors,
  rowCount,
  rowNoun = 'rows',
  minRows = 8,
}: {
  label: string;
  value: string;
  onChange: (text: string) => void;
  columnsHint: string;
  placeholder: string;
  errors: string[];
  rowCount: number;
  rowNoun?: string;
  minRows?: number;
}) {
  const id = `paste-${label.replace(/\W+/g, '-').toLowerCase()}`;
  return (
    <Box>
      <TextField
        id={id}
        label={label}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        placeholder={placeholder}
        multiline
        minRows={minRows}
        maxRows={20}
        fullWidth
        slotProps={{
          // No wrapping: a long row of runs scrolls sideways instead of breaking into two lines.
          htmlInput: {
            spellCheck: false,
            wrap: 'off',
            style: {
              fontFamily: 'ui-monospace, Menlo, Consolas, monospace',
              fontSize: 14,
              overflowX: 'auto',
              tabSize: 6,
            },
          },
        }}
        helperText={`${columnsHint} · ${rowCount} ${rowNoun} read`}
      />
      {errors.length > 0 && (
        <Box role="alert" sx={{ mt: 1 }}>
          {errors.slice(0, 5).map((e) => (
            <Typography key={e} variant="body2" color="error">
              {e}
            </Typography>
          ))}
          {errors.length > 5 && (
            <Typography variant="body2" color="error">
              …and {errors.length - 5} more lines
            </Typography>
          )}
        </Box>
      )}
    </Box>
  );
}
