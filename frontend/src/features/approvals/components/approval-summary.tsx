import { useState } from 'react';
import { Box, Button, IconButton, Paper, Stack, Tooltip, Typography } from '@mui/material';
import ContentCopyOutlined from '@mui/icons-material/ContentCopyOutlined';
import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import VerifiedOutlined from '@mui/icons-material/VerifiedOutlined';
import FactCheckOutlined from '@mui/icons-material/FactCheckOutlined';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { palette } from '../../../theme/theme';
import { dateOnly, dateTime } from '../format';
import { certificateUrl, type Approval } from '../types';

/** The latest approval: who, when, the hash to verify a certificate against, and the download. */
export function ApprovalSummary({
  machineId,
  approval,
  current,
}: {
  machineId: string;
  approval: Approval;
  current: boolean;
}) {
  const [copied, setCopied] = useState(false);
  const copy = () => navigator.clipboard?.writeText(approval.recordHash).then(() => setCopied(true));
  return (
    <Paper
      sx={{ p: 2, borderLeft: `4px solid ${current ? palette.within : palette.notStarted}` }}
      aria-label="Approval"
    >
      <Stack direction={{ xs: 'column', md: 'row' }} spacing={2} sx={{ alignItems: { md: 'center' } }}>
        <VerifiedOutlined sx={{ color: current ? palette.within : palette.notStarted, fontSize: 36 }} />
        <Box sx={{ flexGrow: 1, minWidth: 0 }}>
          <Typography variant="h4" component="p">
            {current ? 'Approved as ready to cut' : 'Last approval (no longer in force)'} by {approval.approvedBy}
          </Typography>
          {approval.reopened && (
            <Typography variant="body2" sx={{ color: '#4d2f78' }}>
              Reopened for changes{approval.reopened.by ? ` by ${approval.reopened.by}` : ''} on{' '}
              {dateTime(approval.reopened.at)}: “{approval.reopened.reason}”
            </Typography>
          )}
          <Typography variant="body2" color="text.secondary">
            Signed {dateTime(approval.approvedAt)} · {approval.recheckDue ? 're-check fell due on' : 're-check due by'}{' '}
            {dateOnly(approval.recheckDueAt)} (every {approval.recheckIntervalDays} days)
          </Typography>
          <Stack direction="row" spacing={0.5} sx={{ alignItems: 'center', mt: 0.5 }}>
            <Typography variant="caption" color="text.secondary">
              Record hash (SHA-256)
            </Typography>
            <Typography
              data-testid="record-hash"
              variant="caption"
              sx={{ fontFamily: 'monospace', wordBreak: 'break-all' }}
            >
              {approval.recordHash}
            </Typography>
            <Tooltip title={copied ? 'Copied' : 'Copy the hash'}>
              <IconButton size="small" onClick={copy} aria-label="Copy the record hash">
                <ContentCopyOutlined fontSize="inherit" />
              </IconButton>
            </Tooltip>
          </Stack>
          <Typography variant="caption" color="text.secondary" component="p">
            {approval.verificationToken
              ? 'The certificate carries an address where anyone can check the owner’s signature against the record as it is kept now.'
              : 'Signed before signatures were kept: a printed certificate is genuine when its record hash matches this one.'}
          </Typography>
        </Box>
        <Stack direction={{ xs: 'row', md: 'column' }} useFlexGap sx={{ flexShrink: 0, flexWrap: 'wrap', gap: 1 }}>
          <Button
            variant="outlined"
            startIcon={<DownloadOutlined />}
            href={certificateUrl(machineId, approval.id)}
            download
          >
            Download certificate
          </Button>
          {approval.verificationToken && (
            <Button
              variant="text"
              startIcon={<FactCheckOutlined />}
              component={RouterLink}
              to={paths.verify(approval.verificationToken)}
            >
              Check the signature
            </Button>
          )}
        </Stack>
      </Stack>
    </Paper>
  );
}
