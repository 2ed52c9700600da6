import { useState, type ReactNode } from 'react';
import Snackbar from '@mui/material/Snackbar';
import { NavLink, useNavigate } from 'react-router-dom';
import {
  Alert,
  AppBar,
  Box,
  Chip,
  Divider,
  Drawer,
  IconButton,
  List,
  ListItemButton,
  ListItemIcon,
  ListItemText,
  Toolbar,
  Tooltip,
  Typography,
  useMediaQuery,
} from '@mui/material';
import { useTheme } from '@mui/material/styles';
import MenuIcon from '@mui/icons-material/Menu';
import LogoutOutlined from '@mui/icons-material/LogoutOutlined';
import { navItemsFor } from '../../config/navigation';
import { paths } from '../../config/paths';
import type { User } from '../../lib/session/user';
import { ROLE_LABELS } from '../../lib/session/roles';
import { useLogout } from '../../features/auth/api/logout';
import { PrintStyles } from '../../components/print/print-styles';

const DRAWER_WIDTH = 232;

export function AppFrame({ user, children }: { user: User; children: ReactNode }) {
  const theme = useTheme();
  const wide = useMediaQuery(theme.breakpoints.up('lg'));
  const [open, setOpen] = useState(false);
  const logout = useLogout();
  const navigate = useNavigate();

  const nav = (
    <Box component="nav" aria-label="Main" sx={{ pt: 1 }}>
      <List>
        {navItemsFor(user.role).map((item) => (
          <ListItemButton
            key={item.path}
            component={NavLink}
            to={item.path}
            onClick={() => setOpen(false)}
            sx={{
              mx: 1,
              borderRadius: 1,
              '&.active': { bgcolor: 'rgba(29,79,74,0.12)', color: 'primary.dark', fontWeight: 600 },
            }}
          >
            <ListItemIcon sx={{ minWidth: 36, color: 'inherit' }}>
              <item.icon fontSize="small" />
            </ListItemIcon>
            <ListItemText primary={item.label} />
          </ListItemButton>
        ))}
      </List>
    </Box>
  );

  return (
    <Box sx={{ display: 'flex', minHeight: '100vh' }}>
      <AppBar position="fixed" sx={{ zIndex: (t) => t.zIndex.drawer + 1, bgcolor: 'primary.dark' }}>
        <Toolbar sx={{ gap: 1.5 }}>
          {!wide && (
            <IconButton color="inherit" edge="start" aria-label="Open navigation" onClick={() => setOpen(true)}>
              <MenuIcon />
            </IconButton>
          )}
          <Box component="img" src="/railwright.svg" alt="" sx={{ width: 28, height: 28 }} />
          <Typography variant="h6" component="span" sx={{ fontWeight: 700, letterSpacing: '0.02em' }}>
            Railwright
          </Typography>
          <Divider
            orientation="vertical"
            flexItem
            sx={{ borderColor: 'rgba(255,255,255,0.25)', mx: 0.5, display: { xs: 'none', sm: 'block' } }}
          />
          <Typography
            component="span"
            sx={{ flexGrow: 1, opacity: 0.9, display: { xs: 'none', sm: 'block' } }}
            noWrap
            data-testid="workshop-name"
          >
            {user.workshop.name}
          </Typography>
          <Box sx={{ flexGrow: { xs: 1, sm: 0 } }} />
          <Typography component="span" sx={{ display: { xs: 'none', md: 'block' }, opacity: 0.9 }}>
            {user.name}
          </Typography>
          <Chip
            label={ROLE_LABELS[user.role]}
            size="small"
            sx={{ bgcolor: 'secondary.main', color: 'secondary.contrastText', fontWeight: 600 }}
          />
          <Tooltip title="Sign out">
            <IconButton
              color="inherit"
              aria-label="Sign out"
              onClick={() => logout.mutate(undefined, { onSuccess: () => navigate(paths.signIn) })}
            >
              <LogoutOutlined />
            </IconButton>
          </Tooltip>
        </Toolbar>
      </AppBar>
      <Snackbar
        open={logout.isError && !(logout.error as { status?: number } | null)?.status}
        onClose={() => logout.reset()}
        anchorOrigin={{ vertical: 'top', horizontal: 'center' }}
      >
        <Alert severity="warning" onClose={() => logout.reset()} role="alert">
          {logout.error?.message}
        </Alert>
      </Snackbar>
      <Drawer
        variant={wide ? 'permanent' : 'temporary'}
        open={wide || open}
        onClose={() => setOpen(false)}
        sx={{
          width: wide ? DRAWER_WIDTH : undefined,
          flexShrink: 0,
          '& .MuiDrawer-paper': {
            width: DRAWER_WIDTH,
            boxSizing: 'border-box',
            bgcolor: '#fbfaf7',
            border: 'none',
            borderRight: '1px solid #e2ded4',
          },
        }}
      >
        <Toolbar />
        {nav}
      </Drawer>
      <Box component="main" sx={{ flexGrow: 1, minWidth: 0, p: { xs: 2, sm: 3 }, pt: { xs: 10, sm: 11 } }}>
        <PrintStyles />
        <Typography data-print="only" variant="body2" color="text.secondary" sx={{ mb: 1 }}>
          Railwright · {user.workshop.name} · printed {new Date().toISOString().slice(0, 16).replace('T', ' ')} UTC by{' '}
          {user.name}
        </Typography>
        {children}
      </Box>
    </Box>
  );
}
