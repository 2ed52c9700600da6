import type { SvgIconComponent } from '@mui/icons-material';
import PrecisionManufacturingOutlined from '@mui/icons-material/PrecisionManufacturingOutlined';
import CalculateOutlined from '@mui/icons-material/CalculateOutlined';
import TuneOutlined from '@mui/icons-material/TuneOutlined';
import GroupOutlined from '@mui/icons-material/GroupOutlined';
import MarkEmailReadOutlined from '@mui/icons-material/MarkEmailReadOutlined';
import HistoryOutlined from '@mui/icons-material/HistoryOutlined';
import type { Role } from '../lib/session/user';
import { paths } from './paths';

export interface NavItem {
  label: string;
  path: string;
  icon: SvgIconComponent;
  /** Roles that see the item; all signed-in roles when absent. */
  roles?: Role[];
}

export const NAV_ITEMS: NavItem[] = [
  { label: 'Machines', path: paths.machines, icon: PrecisionManufacturingOutlined },
  { label: 'Target sets', path: paths.targetSets, icon: TuneOutlined },
  { label: 'Calculators', path: paths.calculators, icon: CalculateOutlined },
  { label: 'People', path: paths.people, icon: GroupOutlined, roles: ['admin'] },
  { label: 'Outbox', path: paths.outbox, icon: MarkEmailReadOutlined, roles: ['admin'] },
  { label: 'Activity', path: paths.activity, icon: HistoryOutlined, roles: ['admin', 'owner'] },
];

export const navItemsFor = (role: Role) => NAV_ITEMS.filter((i) => !i.roles || i.roles.includes(role));
