import { Alert, Typography } from '@mui/material';
import ReportProblemOutlined from '@mui/icons-material/ReportProblemOutlined';

/**
 * Shown in place of a record's numbers when its stored values cannot be read (an old or damaged
 * row): the message comes from the server and says what to do. `inline` fits a table cell.
 */
export function UnreadableRecord({ message, inline = false }: { message: string; inline?: boolean }) {
  if (inline) {
    return (
      <Typography
        variant="body2"
        color="warning.main"
        role="note"
        sx={{ display: 'flex', gap: 0.5, alignItems: 'flex-start' }}
      >
        <ReportProblemOutlined fontSize="inherit" sx={{ mt: '3px' }} aria-hidden />
        <span>Cannot be read. {message}</span>
      </Typography>
    );
  }
  return (
    <Alert severity="warning" role="note">
      {message}
    </Alert>
  );
}
