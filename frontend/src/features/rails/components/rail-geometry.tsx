import type { ReactNode } from 'react';
import { Box, Button, Chip, Paper, Stack, Typography } from '@mui/material';
import { UNIT_LABELS } from '../../../lib/units';
import type { Rail } from '../types';

/** The rail as built: length, profile, hole pitch and every hole position. */
export function RailGeometry({
  rail,
  partnerLabel,
  actions,
}: {
  rail: Rail;
  partnerLabel: string | null;
  actions?: ReactNode;
}) {
  const u = UNIT_LABELS[rail.lengthUnit];
  // Six significant figures: typed values read as typed, a default converted from mm stays short.
  const withMm = (v: number, mm: number) =>
    rail.lengthUnit === 'mm'
      ? `${Number(v.toPrecision(6))} mm`
      : `${Number(v.toPrecision(6))} ${u} (${Number(mm.toFixed(3))} mm)`;
  const facts: [string, string][] = [
    ['Axis', rail.axis],
    ['Length', withMm(rail.length, rail.lengthMm)],
    ['Profile size', rail.profileSize ? `${rail.profileSize} mm` : 'not given'],
    [
      'Hole pitch',
      `${withMm(rail.holePitch, rail.holePitchMm)}, first hole at ${withMm(rail.firstHole, rail.firstHoleMm)}`,
    ],
    [
      'End distance',
      `${withMm(rail.endDistance, rail.endDistanceMm)} from each end${rail.endDistanceIsDefault ? ' (default: half the bolt head, common practice)' : ''}`,
    ],
    [
      'Spacing to partner',
      rail.spacing === null || rail.spacingMm === null
        ? 'not given (needed for the height target S = a × K)'
        : withMm(rail.spacing, rail.spacingMm),
    ],
    [
      'Typical bolt',
      rail.typicalBoltSize ? `${rail.typicalBoltSize} (from memory for this rail size; check the rail drawing)` : '—',
    ],
    ['Partner rail', partnerLabel ?? 'none'],
  ];
  return (
    <Paper component="section" aria-label="Rail geometry" sx={{ p: { xs: 1.5, sm: 2.5 } }}>
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap', mb: 1.5 }}>
        <Typography variant="h3" component="h2" sx={{ flex: '1 1 200px' }}>
          Geometry
        </Typography>
        {/* Actions on this rail: edit, delete, and the bolt-down guide. */}
        <Box data-testid="rail-actions" sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
          {actions}
          <Button variant="outlined" href={`/api/rails/${rail.id}/template.pdf`} target="_blank" rel="noopener">
            Print template (PDF)
          </Button>
        </Box>
      </Box>
      <Stack spacing={0.75} sx={{ mb: 2 }}>
        {facts.map(([k, v]) => (
          <Box key={k} sx={{ display: 'flex', gap: 2 }}>
            <Typography sx={{ width: 120, flexShrink: 0, color: 'text.secondary' }}>{k}</Typography>
            <Typography sx={{ fontWeight: 500 }}>{v}</Typography>
          </Box>
        ))}
      </Stack>
      <Typography color="text.secondary" sx={{ mb: 1 }}>
        {rail.holes.length} holes ({u} from the rail's start)
      </Typography>
      <Box
        sx={{ display: 'flex', flexWrap: 'wrap', gap: 0.5, maxHeight: 132, overflow: 'auto' }}
        aria-label="Hole positions"
      >
        {rail.holes.map((h) => (
          <Chip key={h.index} size="small" variant="outlined" label={h.at} />
        ))}
      </Box>
    </Paper>
  );
}
