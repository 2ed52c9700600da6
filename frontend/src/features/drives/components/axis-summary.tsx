import { Box, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { Axis } from '../types';
import { showDateTime, showFeed, showLength, showPercent, showSteps, showStepsPerInch } from '../utils/format';
import { UNIT_LABELS } from '../../../lib/units';

function Item({ label, value, sub }: { label: string; value: string; sub?: string }) {
  return (
    <Box>
      <Typography variant="body2" color="text.secondary">
        {label}
      </Typography>
      <Typography sx={{ fontWeight: 600 }}>{value}</Typography>
      {sub && (
        <Typography variant="body2" color="text.secondary">
          {sub}
        </Typography>
      )}
    </Box>
  );
}

/** The axis's drive at a glance: the value in use beside the theoretical one, and its history. */
export function AxisSummary({ axis }: { axis: Axis }) {
  const inches = axis.lengthUnit === 'in' || axis.lengthUnit === 'thou';
  const u = UNIT_LABELS[axis.lengthUnit];
  return (
    <Paper sx={{ p: 2.5 }}>
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr 1fr', md: 'repeat(4, 1fr)' }, gap: 2 }}>
        <Item
          label="Steps per mm in use"
          value={`${showSteps(axis.stepsPerMm)}${inches ? ` · ${showStepsPerInch(axis.stepsPerInch)}` : ''}`}
          sub={`${showPercent(axis.stepsPerMmDifferencePercent, 3)} from theoretical`}
        />
        <Item
          label="Theoretical from the drive"
          value={`${showSteps(axis.theoreticalStepsPerMm)}${inches ? ` · ${showStepsPerInch(axis.theoreticalStepsPerInch)}` : ''}`}
          sub={`${Number(axis.travelPerRev.toFixed(inches ? 5 : 4))} ${u} per ${axis.drive.type === 'screw' ? 'screw' : axis.drive.type === 'belt' ? 'pulley' : 'pinion'} turn`}
        />
        <Item
          label="Drive"
          value={axis.driveSummary}
          sub={`${axis.motorStepsPerRev} steps × ${axis.microsteps} microsteps${axis.gearRatio !== 1 ? ` × ${axis.gearRatio}:1` : ''}; ${showLength(axis.resolutionMm, 'um', 2)} per step`}
        />
        <Item
          label="Fastest feed · travel"
          value={`${axis.maxFeedRate ? showFeed(axis.maxFeedRate, axis.lengthUnit) : 'feed not set'} · ${axis.measuredTravel ? `${axis.measuredTravel} ${u}` : 'travel not measured'}`}
          sub={`Set up in ${u}`}
        />
      </Box>
      {axis.notes && (
        <Typography color="text.secondary" sx={{ mt: 1.5 }}>
          {axis.notes}
        </Typography>
      )}
      {axis.stepsHistory.length > 0 && (
        <Box sx={{ mt: 2, overflowX: 'auto' }}>
          <Typography variant="h5" component="h3" gutterBottom>
            Steps per mm history
          </Typography>
          <Table size="small" aria-label="Steps per mm history">
            <TableHead>
              <TableRow>
                <TableCell>When</TableCell>
                <TableCell align="right">From</TableCell>
                <TableCell align="right">To</TableCell>
                <TableCell>Why</TableCell>
                <TableCell>By</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {[...axis.stepsHistory].reverse().map((h) => (
                <TableRow key={h.at}>
                  <TableCell>{showDateTime(h.at)}</TableCell>
                  <TableCell align="right">{showSteps(h.from)}</TableCell>
                  <TableCell align="right">{showSteps(h.to)}</TableCell>
                  <TableCell>{h.reason === 'travel-trial' ? 'Travel trial applied' : 'Edited'}</TableCell>
                  <TableCell>{h.by}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </Box>
      )}
    </Paper>
  );
}
