import type { ReactNode } from 'react';
import {
  Alert,
  Box,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import type { TestCut } from '../types';
import { showDate, showLength, showSigned, showTarget } from '../utils/format';
import { UnreadableRecord } from '../../../components/unreadable-record';
import { StatusChip } from './status-chip';
import { ResultWarnings } from './result-warnings';

const SHORT: Record<string, string> = {
  'outside-x': 'Outside X',
  'outside-y': 'Outside Y',
  'circle-x': 'Circle ⌀ along X',
  'circle-y': 'Circle ⌀ along Y',
};

const POINTS_TO: Record<NonNullable<TestCut['result']>['ovalityPointsTo'], string> = {
  round: 'round',
  scale: 'unequal scale',
  'x-backlash': 'backlash on X',
  'y-backlash': 'backlash on Y',
};

/** What a test cut says: scale per axis and its correction, squareness, ovality, part sizes against ±. */
export function TestCutResults({ cut, actions }: { cut: TestCut; actions?: ReactNode }) {
  const r = cut.result;
  const tol = cut.targets.part;
  const u = cut.lengthUnit;
  const digits = u === 'in' ? 4 : u === 'thou' ? 1 : u === 'um' ? 0 : 2;
  const heading = (
    <Box sx={{ display: 'flex', gap: 1.5, alignItems: 'center', flexWrap: 'wrap' }}>
      <Typography variant="h4" component="p">
        Test cut of {showDate(cut.recordedAt)}
      </Typography>
      <StatusChip status={cut.status} />
      <Typography variant="body2" color="text.secondary">
        by {cut.recordedBy.name}
      </Typography>
      {actions}
    </Box>
  );
  if (!r) {
    return (
      <Stack spacing={2}>
        {heading}
        <UnreadableRecord message={cut.unreadable ?? 'This test cut cannot be read.'} />
      </Stack>
    );
  }
  return (
    <Stack spacing={2}>
      {heading}
      <Typography variant="body2" color="text.secondary">
        Plate {cut.plateThicknessMm === null ? 'thickness not recorded' : showLength(cut.plateThicknessMm, u, digits)}
        {cut.resolution !== null && ` · sizes read to ${cut.resolution} ${u === 'um' ? 'µm' : u}`}
        {cut.note && ` · ${cut.note}`}
      </Typography>
      <ResultWarnings warnings={cut.warnings} label="Test cut warnings" />
      <TableContainer>
        <Table size="small" aria-label="Scale per axis" sx={{ '& td': { whiteSpace: 'nowrap' } }}>
          <TableHead>
            <TableRow>
              <TableCell>Axis</TableCell>
              <TableCell align="right">Commanded</TableCell>
              <TableCell align="right">{cut.measured.kerf ? 'Measured + kerf' : 'Measured'}</TableCell>
              <TableCell align="right">Scale error</TableCell>
              <TableCell align="right">Steps/mm × factor</TableCell>
              <TableCell align="right">Suggested steps/mm</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {(['x', 'y'] as const).map((k) => (
              <TableRow key={k}>
                <TableCell>{k.toUpperCase()}</TableCell>
                <TableCell align="right">{showLength(r[k].commandedMm, u, digits)}</TableCell>
                <TableCell align="right">{showLength(r[k].afterKerfMm, u, digits)}</TableCell>
                <TableCell align="right">
                  {r[k].errorPercent >= 0 ? '+' : '−'}
                  {Math.abs(r[k].errorPercent).toFixed(3)} %
                  <Typography variant="caption" color="text.secondary" component="div">
                    {showSigned(r[k].errorMm, u, digits)}
                  </Typography>
                </TableCell>
                <TableCell align="right">× {r[k].correctionFactor.toFixed(5)}</TableCell>
                <TableCell align="right">
                  {r[k].suggestedStepsPerMm === null ? '—' : `${r[k].suggestedStepsPerMm.toFixed(4)} steps/mm`}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
      <Typography variant="body2" color="text.secondary">
        New steps per mm = old × commanded ÷ measured, per axis (common practice). Set steps per mm first, then square
        the gantry, re-home and cut again.
      </Typography>
      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' } }}>
        <Box>
          <Typography variant="h5" component="h4">
            Squareness
          </Typography>
          <Typography>
            {r.squareness.mmPerMetre.toFixed(3)} mm/m · {r.outOfSquareArcsec.toFixed(0)}″ · diagonal{' '}
            {r.squareness.longDiagonal} long by {r.squareness.diagonalDifferenceMm.toFixed(2)} mm
          </Typography>
          <Typography variant="body2" color="text.secondary">
            Target {showTarget(cut.targets.squareness)}
          </Typography>
        </Box>
        <Box>
          <Typography variant="h5" component="h4">
            Ovality: {showLength(r.ovality, u, digits)} · {POINTS_TO[r.ovalityPointsTo]}
          </Typography>
          <Typography variant="body2">{r.ovalityExplanation}</Typography>
        </Box>
      </Box>
      <TableContainer>
        <Table size="small" aria-label="Part sizes" sx={{ '& td, & th': { whiteSpace: 'nowrap' } }}>
          <TableHead>
            <TableRow>
              <TableCell>Part size</TableCell>
              <TableCell align="right">Programmed</TableCell>
              <TableCell align="right">{cut.measured.kerf ? 'After kerf' : 'As cut'}</TableCell>
              <TableCell align="right">Deviation</TableCell>
              <TableCell align="right">Tolerance</TableCell>
              <TableCell>Result</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {r.parts.map((p) => (
              <TableRow key={p.part}>
                <TableCell sx={{ whiteSpace: 'normal !important', minWidth: 180 }}>
                  {SHORT[p.part] ?? p.label}
                  <Typography variant="caption" color="text.secondary" component="div">
                    {p.toleranceBasis}
                  </Typography>
                </TableCell>
                <TableCell align="right">{showLength(p.nominalMm, u, digits)}</TableCell>
                <TableCell align="right">{showLength(p.afterKerfMm, u, digits)}</TableCell>
                <TableCell
                  align="right"
                  sx={{ color: p.within ? 'inherit' : 'error.main', fontWeight: p.within ? 400 : 600 }}
                >
                  {showSigned(p.deviationMm, u, digits)}
                </TableCell>
                <TableCell align="right">± {showLength(p.toleranceMm, u, digits)}</TableCell>
                <TableCell>{p.within ? 'within' : 'outside'}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
      <Typography variant="body2" color="text.secondary">
        Target ± {showTarget(tol)} · source: {tol.source ?? 'the machine’s target set'}
      </Typography>
      {r.notes.map((n) => (
        <Alert key={n} severity="info">
          {n[0].toUpperCase() + n.slice(1)}.
        </Alert>
      ))}
    </Stack>
  );
}
