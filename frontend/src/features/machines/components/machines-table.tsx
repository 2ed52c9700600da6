import { Link as RouterLink } from 'react-router-dom';
import { Link, Paper, Table, TableBody, TableCell, TableContainer, TableHead, TableRow } from '@mui/material';
import { paths } from '../../../config/paths';
import { KIND_LABELS, type MachineListItem } from '../types';
import { MachineStateChip } from './machine-state-chip';

export function MachinesTable({ machines }: { machines: MachineListItem[] }) {
  return (
    <TableContainer component={Paper}>
      <Table aria-label="Machines">
        <TableHead>
          <TableRow>
            <TableCell>Name</TableCell>
            <TableCell>Kind</TableCell>
            <TableCell>State</TableCell>
            <TableCell>Checks within target</TableCell>
            <TableCell>Last activity</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {machines.map((m) => (
            <TableRow key={m.id} hover>
              <TableCell>
                <Link component={RouterLink} to={paths.machine(m.id)}>{m.name}</Link>
              </TableCell>
              <TableCell>{KIND_LABELS[m.kind]}</TableCell>
              <TableCell><MachineStateChip state={m.state} /></TableCell>
              <TableCell>{m.checks.within} of {m.checks.total}</TableCell>
              <TableCell>{new Date(m.lastActivityAt).toLocaleString()}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
