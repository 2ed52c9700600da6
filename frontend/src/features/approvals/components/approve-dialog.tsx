import { useState } from 'react';
import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  List,
  ListItem,
  ListItemText,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import { useApproveMachine } from '../api/approve-machine';
import { KIND_LABELS, type Readiness } from '../types';

/** The signature: read the statement (edit it if needed), read the cautions, re-enter the password. */
export function ApproveDialog({
  open,
  onClose,
  machineName,
  readiness,
}: {
  open: boolean;
  onClose: () => void;
  machineName: string;
  readiness: Readiness;
}) {
  const [statement, setStatement] = useState(readiness.defaultStatement);
  const [password, setPassword] = useState('');
  const approve = useApproveMachine(readiness.machineId);
  const close = () => {
    setPassword('');
    approve.reset();
    onClose();
  };
  const waived = readiness.checks.filter((c) => c.status === 'waived');
  const statementOk = statement.trim().length >= 20;
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="md" scroll="paper" aria-labelledby="approve-title">
      <DialogTitle id="approve-title">Approve {machineName} as ready to cut</DialogTitle>
      <DialogContent dividers>
        <Stack spacing={2}>
          <Typography>
            {readiness.counts.total} required checks: {readiness.counts.within} within target, {readiness.counts.waived}{' '}
            waived. The approval keeps these exact results and a hash over them; the records it is based on can no
            longer be changed.
          </Typography>
          {waived.length > 0 && (
            <Box>
              <Typography variant="subtitle2">Waived checks</Typography>
              <List dense disablePadding>
                {waived.map((c) => (
                  <ListItem key={c.key} disableGutters>
                    <ListItemText
                      primary={`${KIND_LABELS[c.kind]} — ${c.subject}`}
                      secondary={`“${c.waiver?.reason}” (${c.waiver?.by})`}
                    />
                  </ListItem>
                ))}
              </List>
            </Box>
          )}
          <TextField
            label="Statement you sign"
            value={statement}
            onChange={(e) => setStatement(e.target.value)}
            multiline
            minRows={4}
            error={!statementOk}
            helperText={
              statementOk
                ? 'Printed on the certificate as written here.'
                : 'The statement must be at least 20 characters'
            }
          />
          <Alert severity="warning" icon={<WarningAmberOutlined />} sx={{ '& ul': { m: 0, pl: 2 } }}>
            <Typography variant="subtitle2" component="p">
              Before anyone cuts
            </Typography>
            <ul>
              {readiness.cautions.map((c) => (
                <li key={c.title}>
                  <Typography variant="body2">
                    <strong>{c.title}.</strong> {c.text}
                  </Typography>
                </li>
              ))}
            </ul>
          </Alert>
          {approve.error && <Alert severity="error">{approve.error.message}</Alert>}
          <TextField
            label="Your password (to sign)"
            type="password"
            autoComplete="current-password"
            value={password}
            onChange={(e) => setPassword(e.target.value)}
            onKeyDown={(e) =>
              e.key === 'Enter' &&
              password &&
              statementOk &&
              approve.mutate({ password, statement: statement.trim() }, { onSuccess: close })
            }
          />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>Cancel</Button>
        <Button
          variant="contained"
          disabled={!password || !statementOk || approve.isPending}
          onClick={() => approve.mutate({ password, statement: statement.trim() }, { onSuccess: close })}
        >
          Sign and approve
        </Button>
      </DialogActions>
    </Dialog>
  );
}
