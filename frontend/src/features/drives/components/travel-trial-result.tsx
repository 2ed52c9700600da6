import { useState } from 'react';
import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  Paper,
  Stack,
  Typography,
} from '@mui/material';
import { WarningList } from './warning-list';
import { ThermalNote } from './thermal-note';
import { TravelErrorChart } from '../../../components/charts/travel-error-chart';
import { fromMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useApplyTravelTrial } from '../api/apply-travel-trial';
import { useDeleteTravelTrial } from '../api/delete-travel-trial';
import { DeleteRecordButton } from './delete-record-button';
import type { Axis, TravelTrial } from '../types';
import { errorText, showDateTime, showLength, showPercent, showTarget } from '../utils/format';
import { CopyValue } from './copy-value';
import { UnreadableRecord } from '../../../components/unreadable-record';
import { DriveStatusChip } from './drive-status-chip';

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <Box>
      <Typography variant="body2" color="text.secondary">
        {label}
      </Typography>
      <Typography sx={{ fontWeight: 600 }}>{value}</Typography>
    </Box>
  );
}

/** One travel trial's fit, its chart, and the corrected value ready to copy and apply. */
export function TravelTrialResult({ axis, trial, mayApply }: { axis: Axis; trial: TravelTrial; mayApply: boolean }) {
  const apply = useApplyTravelTrial(axis.id);
  const remove = useDeleteTravelTrial(axis.id);
  const [confirming, setConfirming] = useState(false);
  const r = trial.result;
  // Errors and residuals are small: shown in the reading unit.
  const unit: LengthUnit = trial.readingUnit;
  const lengthUnit: LengthUnit = trial.lengthUnit;
  if (!r) {
    return (
      <Paper sx={{ p: 2.5 }} component="section" aria-label="Travel trial result">
        <Typography variant="h4" component="h3" gutterBottom>
          Travel trial of {showDateTime(trial.recordedAt)}
        </Typography>
        <UnreadableRecord message={trial.unreadable ?? 'This trial cannot be read.'} />
        {mayApply && (
          <Box sx={{ mt: 1 }}>
            <DeleteRecordButton
              what="trial"
              locked={trial.locked}
              onDelete={() => remove.mutate(trial.id)}
              pending={remove.isPending}
              error={remove.error}
            />
          </Box>
        )}
      </Paper>
    );
  }
  const corrected = Number(r.correctedStepsPerMm.toFixed(4)).toString();
  const differs = Math.abs(axis.stepsPerMm - Number(corrected)) > 1e-9;
  const inches = axis.lengthUnit === 'in' || axis.lengthUnit === 'thou';
  const applyNow = () => (r.farFromTheory ? setConfirming(true) : apply.mutate({ trialId: trial.id }));
  return (
    <Paper sx={{ p: 2.5 }} component="section" aria-label="Travel trial result">
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, flexWrap: 'wrap', mb: 1.5 }}>
        <Typography variant="h4" component="h3" sx={{ flex: '1 1 auto' }}>
          Travel trial of {showDateTime(trial.recordedAt)}
        </Typography>
        <DriveStatusChip status={trial.status} />
      </Box>
      <WarningList warnings={trial.warnings} />
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr 1fr', md: 'repeat(5, 1fr)' }, gap: 2, mb: 2 }}>
        <Figure label="Scale error" value={showPercent(r.errorPercent)} />
        <Figure label="Target" value={`within ±${showTarget(trial.target)}`} />
        <Figure label="Steps per mm used" value={`${trial.stepsPerMmUsed} steps/mm`} />
        <Figure label="Offset of the fit" value={showLength(r.offset, unit)} />
        <Figure label="Largest residual" value={showLength(r.residualMax, unit)} />
      </Box>
      <Stack spacing={1.5} sx={{ mb: 2 }}>
        <CopyValue label="Corrected steps per mm" value={corrected} unit="steps/mm" />
        {inches && (
          <Typography variant="body2">
            = {Number((r.correctedStepsPerMm * 25.4).toFixed(3))} steps/in (× 25.4)
          </Typography>
        )}
        {r.theoryDifferencePercent !== null && (
          <Typography variant="body2" color={r.farFromTheory ? 'warning.main' : 'text.secondary'}>
            {showPercent(r.theoryDifferencePercent)} from the drive's theoretical{' '}
            {Number(axis.theoreticalStepsPerMm.toFixed(4))} steps/mm
          </Typography>
        )}
        {trial.appliedAt ? (
          <Alert severity="success">
            Applied on {showDateTime(trial.appliedAt)} by {trial.appliedBy}. Set {corrected} steps/mm in the controller,
            then record a confirming trial.
          </Alert>
        ) : (
          mayApply &&
          differs && (
            <Box sx={{ display: 'flex', gap: 1.5, alignItems: 'center', flexWrap: 'wrap' }}>
              <Button
                variant="contained"
                color={r.farFromTheory ? 'warning' : 'primary'}
                onClick={applyNow}
                disabled={apply.isPending}
              >
                Apply {corrected} steps/mm to axis {axis.name}
              </Button>
              <Typography variant="body2" color="text.secondary">
                The axis keeps {axis.stepsPerMm} steps/mm in its history.
              </Typography>
            </Box>
          )
        )}
        {apply.error && <Alert severity="error">{errorText(apply.error)}</Alert>}
      </Stack>
      <Dialog open={confirming} onClose={() => setConfirming(false)} aria-labelledby="far-correction-title">
        <DialogTitle id="far-correction-title">Apply a correction far from the theoretical value?</DialogTitle>
        <DialogContent>
          <DialogContentText>
            {corrected} steps/mm is{' '}
            {r.theoryDifferencePercent !== null ? showPercent(r.theoryDifferencePercent) : 'far'} from the{' '}
            {Number(axis.theoreticalStepsPerMm.toFixed(4))} steps/mm the drive gives. A difference this large usually
            means the screw's pitch was taken for its lead, the pulley has other teeth, the driver's microsteps differ
            from the setting, or the moves were not all typed in the same unit. Check those first.
          </DialogContentText>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setConfirming(false)} autoFocus>
            Check first
          </Button>
          <Button
            color="warning"
            variant="contained"
            onClick={() =>
              apply.mutate({ trialId: trial.id, confirmFarCorrection: true }, { onSettled: () => setConfirming(false) })
            }
            disabled={apply.isPending}
          >
            Apply anyway
          </Button>
        </DialogActions>
      </Dialog>
      <TravelErrorChart
        label={`Error against commanded distance, ${UNIT_LABELS[unit]}`}
        unitLabel={UNIT_LABELS[unit]}
        moves={r.moves.map((m) => ({ commanded: m.commanded, error: fromMm(m.error, unit) }))}
        fit={{ slope: fromMm(r.scale - 1, unit), offset: fromMm(r.offset, unit) }}
        height={260}
      />
      <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
        {trial.moves.length} move{trial.moves.length === 1 ? '' : 's'} commanded and measured in{' '}
        {UNIT_LABELS[lengthUnit]}
        {trial.throughOrigin ? ', fitted through zero' : ''} · recorded by {trial.recordedBy}
        {trial.notes ? ` · ${trial.notes}` : ''}
      </Typography>
      <ThermalNote record={trial} />
      {mayApply && (
        <Box sx={{ mt: 1 }}>
          <DeleteRecordButton
            what="trial"
            locked={trial.locked}
            onDelete={() => remove.mutate(trial.id)}
            pending={remove.isPending}
            error={remove.error}
          />
        </Box>
      )}
    </Paper>
  );
}
