import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { Box, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { palette } from '../../../theme/theme';
import type { DiagonalCheck } from '../types';
import { showDate } from '../utils/format';
import { UnreadableRecord } from '../../../components/unreadable-record';
import { StatusChip } from './status-chip';
import { ResponsiveTable } from '../../../components/table/responsive-table';

/** Every diagonal check of the machine, oldest first, so squaring can be seen to converge. */
export function SquaringHistory({
  checks,
  selectedId,
  onSelect,
}: {
  checks: DiagonalCheck[];
  selectedId?: string;
  onSelect: (c: DiagonalCheck) => void;
}) {
  const ordered = [...checks].reverse();
  const target = checks[0]?.target;
  // A check that cannot be read keeps its number in the table but has no point on the chart.
  const rows = ordered.flatMap((c, i) =>
    c.result ? [{ n: i + 1, mmPerMetre: Number(c.result.mmPerMetre.toFixed(4)) }] : [],
  );
  return (
    <Box>
      {rows.length >= 2 && (
        <Box component="figure" aria-label="Squaring history chart" sx={{ m: 0, mb: 1 }}>
          <ResponsiveContainer width="100%" height={200}>
            <LineChart data={rows} margin={{ top: 12, right: 24, bottom: 18, left: 4 }}>
              <CartesianGrid stroke="#e2ded4" />
              <XAxis
                dataKey="n"
                type="number"
                domain={[1, rows.length]}
                allowDecimals={false}
                tickCount={rows.length}
                label={{ value: 'Check', position: 'insideBottom', offset: -8 }}
              />
              <YAxis
                domain={[0, 'auto']}
                width={64}
                label={{ value: 'mm/m', angle: -90, position: 'insideLeft', offset: 8 }}
              />
              <Tooltip
                formatter={(v) => [`${Number(v).toFixed(3)} mm/m`, 'Out of square']}
                labelFormatter={(n) => `Check ${n}`}
              />
              {target && (
                <ReferenceLine
                  y={target.value}
                  ifOverflow="extendDomain"
                  stroke={palette.brass}
                  strokeDasharray="6 4"
                  label={{
                    value: `target ${target.value} mm/m`,
                    position: 'insideBottomLeft',
                    fill: '#6b5420',
                    fontSize: 12,
                  }}
                />
              )}
              <Line
                dataKey="mmPerMetre"
                stroke={palette.steel}
                strokeWidth={2}
                dot={{ r: 4 }}
                isAnimationActive={false}
              />
            </LineChart>
          </ResponsiveContainer>
        </Box>
      )}
      <ResponsiveTable>
        <Table size="small" aria-label="Diagonal checks">
          <TableHead>
            <TableRow>
              <TableCell>#</TableCell>
              <TableCell>Recorded</TableCell>
              <TableCell align="right">Out of square</TableCell>
              <TableCell>Long diagonal</TableCell>
              <TableCell align="right">Move</TableCell>
              <TableCell>Status</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {ordered.map((c, i) => (
              <TableRow
                key={c.id}
                hover
                selected={c.id === selectedId}
                onClick={() => onSelect(c)}
                sx={{ cursor: 'pointer' }}
              >
                <TableCell>{i + 1}</TableCell>
                <TableCell>
                  <Typography variant="body2">{showDate(c.recordedAt)}</Typography>
                  <Typography variant="caption" color="text.secondary">
                    {c.recordedBy.name}
                  </Typography>
                </TableCell>
                {c.result ? (
                  <>
                    <TableCell align="right">
                      {c.result.mmPerMetre.toFixed(3)} mm/m
                      <Typography variant="caption" color="text.secondary" component="div">
                        {c.result.outOfSquareArcsec.toFixed(0)}″
                      </Typography>
                    </TableCell>
                    <TableCell>
                      {c.result.diagonalDifferenceMm === 0
                        ? 'equal'
                        : `${c.result.longDiagonal} (+${c.result.diagonalDifferenceMm.toFixed(2)} mm)`}
                    </TableCell>
                    <TableCell align="right">{c.result.correction.moveMm.toFixed(2)} mm</TableCell>
                  </>
                ) : (
                  <TableCell colSpan={3}>
                    <UnreadableRecord inline message={c.unreadable ?? ''} />
                  </TableCell>
                )}
                <TableCell>
                  <StatusChip status={c.status} />
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </ResponsiveTable>
    </Box>
  );
}
