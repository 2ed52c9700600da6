import { Box, Paper, Typography } from '@mui/material';
import { dateOnly, dateTime, type PublicVerification } from '../types';

const KIND_WORDS: Record<string, string> = { plasma: 'Plasma table', router: 'Router', other: 'Gantry machine' };

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <Box sx={{ minWidth: 0 }}>
      <Typography
        variant="caption"
        color="text.secondary"
        component="dt"
        sx={{ textTransform: 'uppercase', letterSpacing: 0.4 }}
      >
        {label}
      </Typography>
      <Typography component="dd" sx={{ m: 0, overflowWrap: 'anywhere' }}>
        {children}
      </Typography>
    </Box>
  );
}

/** What the certificate says: the machine, who signed what and when, and until when it holds. */
export function ApprovalFacts({ v }: { v: PublicVerification }) {
  return (
    <Paper sx={{ p: { xs: 2, sm: 3 } }}>
      <Typography variant="h4" component="h2" sx={{ mb: 2 }}>
        {v.machine.name}{' '}
        <Typography component="span" color="text.secondary">
          · {KIND_WORDS[v.machine.kind] ?? v.machine.kind} · {v.workshop}
        </Typography>
      </Typography>
      <Box
        component="dl"
        sx={{
          m: 0,
          display: 'grid',
          gap: 2,
          gridTemplateColumns: { xs: '1fr', sm: 'repeat(2, minmax(0, 1fr))', md: 'repeat(3, minmax(0, 1fr))' },
        }}
      >
        <Fact label="Approved as ready to cut by">{v.signedBy}</Fact>
        <Fact label="Signed on">{dateTime(v.signedAt)}</Fact>
        <Fact label="Re-check due by">
          {dateOnly(v.recheckDueAt)} (every {v.recheckIntervalDays} days)
        </Fact>
        <Fact label="Checks">
          {v.checkCount} required{v.waivedCount ? `, ${v.waivedCount} waived with a written reason` : ', none waived'}
        </Fact>
        <Fact label="Judged against">{v.targetSet}</Fact>
        <Fact label="Approval">
          {v.stands
            ? v.recheckDue
              ? 'Stands; its re-check is due'
              : 'Stands'
            : v.reopened
              ? `Reopened ${dateOnly(v.reopened.at)}`
              : 'No longer stands'}
        </Fact>
      </Box>
      <Typography
        variant="caption"
        color="text.secondary"
        component="p"
        sx={{ mt: 2, textTransform: 'uppercase', letterSpacing: 0.4 }}
      >
        Statement signed
      </Typography>
      <Typography
        component="blockquote"
        sx={{ m: 0, mt: 0.5, pl: 2, borderLeft: '3px solid', borderColor: 'secondary.main', fontStyle: 'italic' }}
      >
        {v.statement}
      </Typography>
    </Paper>
  );
}
