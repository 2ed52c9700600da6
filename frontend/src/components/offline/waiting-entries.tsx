import { Box, Chip, Paper, Typography } from '@mui/material';
import ScheduleOutlined from '@mui/icons-material/ScheduleOutlined';
import { useWaitingEntries } from '../../lib/offline/use-waiting-entries';

/** Entries typed here for `path` that wait on the device for the connection, shown where they will land. */
export function WaitingEntries({ path }: { path: string }) {
  const waiting = useWaitingEntries(path);
  if (!waiting.length) return null;
  return (
    <Paper variant="outlined" sx={{ p: 1.5, borderStyle: 'dashed' }} aria-label="Entries waiting to be sent">
      <Box component="ul" sx={{ m: 0, p: 0, listStyle: 'none', display: 'grid', gap: 1 }}>
        {waiting.map((v) => (
          <Box component="li" key={v.key} sx={{ display: 'flex', gap: 1, alignItems: 'center', flexWrap: 'wrap' }}>
            <Chip
              size="small"
              icon={<ScheduleOutlined />}
              label="Waiting to be sent"
              color="warning"
              variant="outlined"
            />
            <Typography variant="body2">{v.label}</Typography>
          </Box>
        ))}
      </Box>
    </Paper>
  );
}
