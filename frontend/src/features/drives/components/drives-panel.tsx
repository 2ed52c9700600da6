import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import {
  Box,
  Button,
  Link,
  Paper,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import { paths } from '../../../config/paths';
import { EmptyState } from '../../../components/states/empty-state';
import { ErrorState } from '../../../components/states/error-state';
import { LoadingState } from '../../../components/states/loading-state';
import { useMe } from '../../../lib/session/get-me';
import { canCalibrate } from '../../../lib/session/roles';
import { useAxes } from '../api/get-axes';
import type { AxisListItem, CheckSummary } from '../types';
import { showPercent, showSteps } from '../utils/format';
import { AxisFormDialog } from './axis-form-dialog';
import { DriveStatusChip } from './drive-status-chip';
import { TravelEnvelopeCard } from './travel-envelope-card';
import { ResponsiveTable } from '../../../components/table/responsive-table';

/** The chip, with the headline figure under it and the full summary on hover. */
function CheckCell({ check }: { check: CheckSummary }) {
  const headline = check.headline;
  return (
    <TableCell title={check.summary}>
      <DriveStatusChip status={check.status} />
      {headline && (
        <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5, maxWidth: 180 }}>
          {headline}
        </Typography>
      )}
    </TableCell>
  );
}

function StepsCell({ a }: { a: AxisListItem }) {
  const off = Math.abs(a.stepsPerMmDifferencePercent) >= 0.0001;
  return (
    <TableCell>
      <Typography sx={{ fontWeight: 500, whiteSpace: 'nowrap' }}>{showSteps(a.stepsPerMm)}</Typography>
      <Typography variant="body2" color="text.secondary">
        theoretical {showSteps(a.theoreticalStepsPerMm)}
        {off ? ` (${showPercent(a.stepsPerMmDifferencePercent, 2)})` : ''}
      </Typography>
    </TableCell>
  );
}

/** The machine file's Drives tab: every axis with its drive, steps per mm and latest checks. */
export function DrivesPanel({ machineId }: { machineId: string }) {
  const axes = useAxes(machineId);
  const me = useMe();
  const mayCalibrate = canCalibrate(me.data?.role);
  const [adding, setAdding] = useState(false);
  if (axes.isPending) return <LoadingState label="Loading axes…" />;
  if (axes.isError) return <ErrorState error={axes.error} onRetry={() => axes.refetch()} />;
  const list = axes.data;
  const addButton = mayCalibrate && (
    <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setAdding(true)}>
      Add axis
    </Button>
  );
  return (
    <Stack spacing={2}>
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 2, flexWrap: 'wrap' }}>
        <Typography color="text.secondary" sx={{ flex: '1 1 320px' }}>
          One record per motor: a gantry driven from both sides has Y1 and Y2. Open an axis to record travel trials,
          repeat-and-reverse runs and its speed check.
        </Typography>
        {list.length > 0 && addButton}
      </Box>
      {list.length === 0 ? (
        <EmptyState title="No axes yet" action={addButton || undefined}>
          Add each axis with its drive (screw, belt or rack and pinion), motor and driver settings and the steps per mm
          set in the controller.
        </EmptyState>
      ) : (
        <ResponsiveTable component={Paper}>
          <Table aria-label="Axes" size="small" sx={{ '& td, & th': { py: 1.25, px: { xs: 1, md: 2 } } }}>
            <TableHead>
              <TableRow>
                <TableCell>Axis</TableCell>
                <TableCell>Drive</TableCell>
                <TableCell>Steps per mm</TableCell>
                <TableCell>Travel trial</TableCell>
                <TableCell>Repeat and reverse</TableCell>
                <TableCell>Speed check</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {list.map((a) => (
                <TableRow key={a.id} hover>
                  <TableCell>
                    <Link component={RouterLink} to={paths.axis(machineId, a.id)} sx={{ fontWeight: 600 }}>
                      {a.name}
                    </Link>
                    <Typography variant="body2" color="text.secondary" sx={{ whiteSpace: 'nowrap' }}>
                      {a.measuredTravel
                        ? `${a.measuredTravel} ${a.lengthUnit === 'um' ? 'µm' : a.lengthUnit} travel`
                        : 'travel not measured'}
                    </Typography>
                  </TableCell>
                  <TableCell sx={{ maxWidth: 260, minWidth: 160 }}>
                    {a.driveSummary}
                    <Typography variant="body2" color="text.secondary">
                      {a.motorStepsPerRev} steps × {a.microsteps} microsteps
                      {a.gearRatio !== 1 ? ` × ${a.gearRatio}:1` : ''}
                    </Typography>
                  </TableCell>
                  <StepsCell a={a} />
                  <CheckCell check={a.checks.travelTrial} />
                  <CheckCell check={a.checks.positioning} />
                  <CheckCell check={a.checks.speedCheck} />
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </ResponsiveTable>
      )}
      <TravelEnvelopeCard machineId={machineId} />
      {mayCalibrate && <AxisFormDialog machineId={machineId} open={adding} onClose={() => setAdding(false)} />}
    </Stack>
  );
}
