import { Chip, Paper, Table, TableBody, TableCell, TableHead, TableRow, Tooltip, Typography } from '@mui/material';
import { ResponsiveTable } from '../../../components/table/responsive-table';
import { positionIn } from '../utils/position-text';
import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { BoltDown } from '../types';
import type { GuideHole } from '../utils/guide-state';
import { plain, signed } from '../utils/format';
import { formatDateTime } from '../../../lib/format-time';

interface Props {
  bd: BoltDown;
  holes: GuideHole[];
  nextHole: number | null;
  selected: number | null;
  /** Present when the person may record: picking a row makes it the hole being fixed. */
  onSelect?: (index: number) => void;
}

function State({ hole, isNext, unit, band }: { hole: GuideHole; isNext: boolean; unit: LengthUnit; band: number }) {
  if (hole.waiting)
    return (
      <Chip
        size="small"
        icon={<CloudUploadOutlined />}
        label="Waiting to send"
        sx={{ bgcolor: 'rgba(200,147,42,0.18)', color: '#6b4a0c' }}
      />
    );
  if (hole.fixed && hole.onTarget === false) {
    // Fixed on purpose outside its band: never shown like a hole fixed on target.
    return (
      <Tooltip
        title={`Fixed ${hole.difference === null ? '' : `${signed(Math.abs(hole.difference), unit).replace(/^[+−]/, '')} off its aim, `}outside the ±${plain(band, unit)} band${hole.fixedBy ? `, by ${hole.fixedBy}` : ''}`}
      >
        <Chip size="small" color="warning" icon={<WarningAmberOutlined />} label="Fixed outside band" />
      </Tooltip>
    );
  }
  if (hole.fixed) {
    return (
      <Tooltip
        title={hole.fixedAt ? `Fixed by ${hole.fixedBy ?? 'someone'} at ${formatDateTime(hole.fixedAt)}` : 'Fixed'}
      >
        <Chip size="small" color="success" variant="outlined" icon={<CheckCircleOutlined />} label="Fixed" />
      </Tooltip>
    );
  }
  if (isNext) return <Chip size="small" color="primary" label="Next" />;
  return (
    <Typography variant="body2" color="text.secondary">
      Open
    </Typography>
  );
}

/** Every hole in the order to fix it, with its aim, reading and state. */
export function HolesTable({ bd, holes, nextHole, selected, onSelect }: Props) {
  const unit = UNIT_LABELS[bd.readingUnit];
  return (
    // Long rails scroll inside the table so the hole being fixed stays in reach above it.
    // On a phone each hole is a card of label–value lines (its place in the order is the card's place).
    <ResponsiveTable
      component={Paper}
      titleFirst={false}
      sx={{
        maxHeight: holes.length > 20 ? 620 : undefined,
        '& tr > :first-of-type': { display: { xs: 'none', sm: 'table-cell' } },
      }}
    >
      <Table size="small" stickyHeader aria-label="Holes in fixing order">
        <TableHead>
          <TableRow>
            <TableCell>Order</TableCell>
            <TableCell>Hole</TableCell>
            <TableCell align="right">Position ({UNIT_LABELS[bd.lengthUnit]})</TableCell>
            <TableCell align="right">Aim ({unit})</TableCell>
            <TableCell align="right">Reading ({unit})</TableCell>
            <TableCell align="right">Difference ({unit})</TableCell>
            <TableCell>State</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {holes.map((h) => (
            <TableRow
              key={h.index}
              hover={!!onSelect}
              selected={h.index === selected}
              onClick={onSelect ? () => onSelect(h.index) : undefined}
              sx={{ cursor: onSelect ? 'pointer' : 'default' }}
              aria-label={`Hole ${h.index + 1}`}
            >
              <TableCell>{h.order + 1}</TableCell>
              <TableCell>{h.index + 1}</TableCell>
              <TableCell align="right">{positionIn(h.position, bd.lengthUnit)}</TableCell>
              <TableCell align="right">
                {h.target === null ? '—' : signed(h.target, bd.readingUnit).replace(` ${unit}`, '')}
              </TableCell>
              <TableCell align="right">
                {h.reading === null ? '—' : signed(h.reading, bd.readingUnit).replace(` ${unit}`, '')}
              </TableCell>
              <TableCell
                align="right"
                sx={{
                  color: h.onTarget === false ? '#8a5a00' : h.onTarget ? 'success.main' : undefined,
                  fontWeight: h.difference !== null ? 500 : undefined,
                }}
              >
                {h.difference === null ? '—' : signed(h.difference, bd.readingUnit).replace(` ${unit}`, '')}
              </TableCell>
              <TableCell>
                <State hole={h} isNext={h.index === nextHole} unit={bd.readingUnit} band={bd.band} />
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </ResponsiveTable>
  );
}
