import { palette } from '../../theme/theme';

/** One set of series colours for every chart, so a reading looks the same everywhere. */
export const chartColors = {
  reading: palette.steel,
  fit: palette.ink,
  band: palette.brass,
  up: palette.steel,
  down: '#a4522f',
  grid: '#e2ded4',
  target: palette.within,
};
