import { Box, Paper, Typography } from '@mui/material';
import GppGoodOutlined from '@mui/icons-material/GppGoodOutlined';
import GppBadOutlined from '@mui/icons-material/GppBadOutlined';
import HelpOutlineOutlined from '@mui/icons-material/HelpOutlineOutlined';
import { palette } from '../../../theme/theme';
import type { PublicVerification } from '../types';
import { formatDate } from '../../../lib/format-time';

const HEADLINES: Record<PublicVerification['status'], string> = {
  valid: 'Signature valid · record unchanged',
  changed: 'Not valid · the record has changed since it was signed',
  unsigned: 'Signed before signatures were kept',
  'unknown-key': 'Signed with a key this server does not hold',
};

/** The answer first, in words and colour: can this certificate be relied on? */
export function VerdictBanner({ v }: { v: PublicVerification }) {
  const good = v.status === 'valid';
  const colour = good ? palette.within : v.status === 'changed' ? palette.outside : palette.notStarted;
  const Icon = good ? GppGoodOutlined : v.status === 'changed' ? GppBadOutlined : HelpOutlineOutlined;
  return (
    <Paper
      role="status"
      aria-label="Verification result"
      sx={{ p: { xs: 2, sm: 3 }, borderLeft: `6px solid ${colour}`, display: 'flex', gap: 2, alignItems: 'flex-start' }}
    >
      <Icon sx={{ color: colour, fontSize: { xs: 36, sm: 44 }, flexShrink: 0 }} />
      <Box sx={{ minWidth: 0 }}>
        <Typography variant="h3" component="h2" sx={{ color: colour, fontWeight: 700 }}>
          {HEADLINES[v.status]}
        </Typography>
        <Typography sx={{ mt: 0.5 }}>{v.message}</Typography>
        {!v.stands && v.reopened && (
          <Typography sx={{ mt: 1, fontWeight: 600, color: '#4d2f78' }}>
            This approval no longer stands: the machine was reopened for changes on {formatDate(v.reopened.at)}
            {v.reopened.by ? ` by ${v.reopened.by}` : ''}. Reason given: “{v.reopened.reason?.replace(/[.\s]+$/, '')}”.
          </Typography>
        )}
      </Box>
    </Paper>
  );
}
