import { useQuery } from '@tanstack/react-query';
import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  InputAdornment,
  MenuItem,
  useMediaQuery,
  useTheme,
} from '@mui/material';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { useOnline } from '../../../components/offline/use-online';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { useBoltTorques } from '../api/get-bolt-torques';
import { sweepQueryOptions } from '../api/get-sweep';
import { useUpdateSweepDetails } from '../api/update-sweep-details';
import type { Sweep } from '../types';
import {
  sweepDetailsFormOf,
  sweepDetailsFormSchema,
  toSweepDetailsPatch,
  type SweepDetailsFormValues,
} from './sweep-details-form-schema';

/** Corrects what was noted with a sweep (datum, notes, instrument, who, bolts); its readings stay as taken. */
export function EditSweepDetailsDialog({
  sweepId,
  title,
  onClose,
}: {
  sweepId: string;
  title: string;
  onClose: () => void;
}) {
  const sweep = useQuery(sweepQueryOptions(sweepId));
  const fullScreen = useMediaQuery(useTheme().breakpoints.down('sm'));
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" fullScreen={fullScreen} aria-labelledby="edit-sweep-title">
      <DialogTitle id="edit-sweep-title">Edit details of the {title}</DialogTitle>
      {sweep.isPending ? (
        <DialogContent>
          <LoadingState label="Loading the sweep…" />
        </DialogContent>
      ) : sweep.isError ? (
        <DialogContent>
          <ErrorState error={sweep.error} onRetry={() => sweep.refetch()} />
        </DialogContent>
      ) : (
        <DetailsForm sweep={sweep.data} onClose={onClose} />
      )}
    </Dialog>
  );
}

function DetailsForm({ sweep, onClose }: { sweep: Sweep; onClose: () => void }) {
  const form = useForm<SweepDetailsFormValues>({
    defaultValues: sweepDetailsFormOf(sweep),
    resolver: zodResolver(sweepDetailsFormSchema),
  });
  const [boltSize, torque] = useWatch({ control: form.control, name: ['boltSize', 'torque'] });
  const torques = useBoltTorques();
  const update = useUpdateSweepDetails(sweep.id);
  const online = useOnline();
  const bolts = torques.data?.bolts ?? [];
  const usual = bolts.find((b) => b.boltSize === boltSize)?.torqueNm;

  const submit = form.handleSubmit((values) => {
    const patch = toSweepDetailsPatch(values, sweep);
    if (!Object.keys(patch).length) return onClose();
    update.mutate(patch, { onSuccess: onClose });
  });

  return (
    <Box component="form" onSubmit={submit} noValidate sx={{ display: 'contents' }}>
      <DialogContent>
        <DialogContentText sx={{ mb: 2 }}>
          The readings and the result stay as they were taken. The change is kept in the machine&apos;s history with the
          values before and after.
        </DialogContentText>
        <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' } }}>
          <FormTextField
            form={form}
            name="datum"
            autoFocus
            label="Datum"
            helperText="The common datum, named the same on the partner rail"
            sx={{ gridColumn: '1 / -1' }}
            slotProps={{ htmlInput: { maxLength: 120 } }}
          />
          <FormTextField
            form={form}
            name="instrument"
            label="Instrument"
            sx={{ gridColumn: '1 / -1' }}
            slotProps={{ htmlInput: { maxLength: 120 } }}
          />
          <FormTextField form={form} name="takenBy" label="Taken by" slotProps={{ htmlInput: { maxLength: 120 } }} />
          <FormTextField
            form={form}
            name="temperature"
            label="Temperature"
            slotProps={{
              htmlInput: { inputMode: 'decimal' },
              input: { endAdornment: <InputAdornment position="end">°C</InputAdornment> },
            }}
          />
          <FormTextField form={form} name="boltSize" select label="Bolt size">
            <MenuItem value="">Not recorded</MenuItem>
            {/* A size recorded earlier stays choosable even if the table no longer lists it. */}
            {[
              ...bolts.map((b) => b.boltSize),
              ...(boltSize && !bolts.some((b) => b.boltSize === boltSize) ? [boltSize] : []),
            ].map((b) => (
              <MenuItem key={b} value={b}>
                {b}
              </MenuItem>
            ))}
          </FormTextField>
          <FormTextField
            form={form}
            name="torque"
            label="Torque"
            helperText={
              usual !== undefined && torque.trim() !== String(usual) ? `Usual for ${boltSize}: ${usual} N·m` : ' '
            }
            slotProps={{
              htmlInput: { inputMode: 'decimal' },
              input: { endAdornment: <InputAdornment position="end">N·m</InputAdornment> },
            }}
          />
          <FormTextField
            form={form}
            name="notes"
            label="Notes"
            multiline
            minRows={2}
            sx={{ gridColumn: '1 / -1' }}
            slotProps={{ htmlInput: { maxLength: 5000 } }}
          />
        </Box>
        {!online && (
          <Alert severity="warning" sx={{ mt: 2 }}>
            Correcting a sweep needs the connection; it is not kept on this device.
          </Alert>
        )}
        {update.error && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {update.error.message}
          </Alert>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button type="submit" variant="contained" disabled={update.isPending || !online}>
          {update.isPending ? 'Saving…' : 'Save details'}
        </Button>
      </DialogActions>
    </Box>
  );
}
