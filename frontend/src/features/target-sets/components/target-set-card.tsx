import { Box, Button, Chip, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import EditOutlined from '@mui/icons-material/EditOutlined';
import ContentCopyOutlined from '@mui/icons-material/ContentCopyOutlined';
import { REFERENCE_WORDS, UNIT_WORDS, type TargetSet } from '../types';
import { TargetSetUsers } from './target-set-users';
import { ResponsiveTable } from '../../../components/table/responsive-table';

/** One target set: every target with its value, unit and where the value came from. */
export function TargetSetCard({
  set,
  canEdit,
  onEdit,
  onCopy,
}: {
  set: TargetSet;
  canEdit: boolean;
  onEdit: () => void;
  onCopy: () => void;
}) {
  const entries = Object.entries(set.targets);
  return (
    <Paper component="section" aria-label={set.name} sx={{ p: { xs: 1.5, sm: 2.5 } }}>
      <Box sx={{ display: 'flex', alignItems: 'flex-start', gap: 2, mb: 1.5, flexWrap: 'wrap' }}>
        <Box sx={{ flex: '1 1 300px' }}>
          <Typography variant="h3" component="h2">
            {set.name}
          </Typography>
          {set.description && <Typography color="text.secondary">{set.description}</Typography>}
        </Box>
        {canEdit ? (
          <Box sx={{ display: 'flex', gap: 1 }}>
            <Button
              startIcon={<EditOutlined />}
              onClick={onEdit}
              aria-label={`Edit ${set.name}`}
              sx={{ minHeight: 44 }}
            >
              Edit or rename
            </Button>
            <Button
              startIcon={<ContentCopyOutlined />}
              onClick={onCopy}
              aria-label={`Copy ${set.name}`}
              sx={{ minHeight: 44 }}
            >
              Copy
            </Button>
          </Box>
        ) : (
          <Chip label="Read only" size="small" variant="outlined" />
        )}
      </Box>
      <TargetSetUsers set={set} />
      <ResponsiveTable>
        <Table size="small" aria-label={`Targets of ${set.name}`}>
          <TableHead>
            <TableRow>
              <TableCell>Target</TableCell>
              <TableCell align="right">Value</TableCell>
              <TableCell>Where the value comes from</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {entries.map(([key, t]) => (
              <TableRow key={key}>
                <TableCell sx={{ minWidth: 180 }}>{t.label}</TableCell>
                <TableCell align="right" sx={{ whiteSpace: 'nowrap', fontWeight: 600 }}>
                  {t.value} {UNIT_WORDS[t.unit]}
                  {key === 'railStraightness'
                    ? `, judged on the ${REFERENCE_WORDS[t.reference ?? 'minimum-zone']}`
                    : ''}
                </TableCell>
                <TableCell sx={{ color: 'text.secondary' }}>{t.source || '—'}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </ResponsiveTable>
    </Paper>
  );
}
