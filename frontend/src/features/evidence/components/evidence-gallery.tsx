import { useState } from 'react';
import {
  Box,
  ButtonBase,
  IconButton,
  Link,
  List,
  ListItem,
  ListItemIcon,
  ListItemText,
  Tooltip,
  Typography,
} from '@mui/material';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import DescriptionOutlined from '@mui/icons-material/DescriptionOutlined';
import LockOutlined from '@mui/icons-material/LockOutlined';
import PictureAsPdfOutlined from '@mui/icons-material/PictureAsPdfOutlined';
import type { Evidence } from '../types';
import { AFTER_APPROVAL, evidenceMeta as meta } from '../utils/evidence-meta';
import { formatBytes } from '../utils/format-bytes';
import { DeleteEvidenceDialog } from './delete-evidence-dialog';
import { EvidenceViewer } from './evidence-viewer';
import { formatDate } from '../../../lib/format-time';

const LOCKED_HINT = 'Kept: part of what an approval stands on';

/** Thumbnails of the photos (click for full size) and a list of the other files. */
export function EvidenceGallery({ items, label = 'Evidence' }: { items: Evidence[]; label?: string }) {
  const [viewing, setViewing] = useState<number | null>(null);
  const [deleting, setDeleting] = useState<Evidence | null>(null);
  const photos = items.filter((i) => i.kind === 'photo');
  const files = items.filter((i) => i.kind === 'file');

  return (
    <Box>
      {photos.length > 0 && (
        <Box
          component="ul"
          aria-label={`Photos: ${label}`}
          sx={{
            listStyle: 'none',
            p: 0,
            m: 0,
            display: 'grid',
            gap: 1.5,
            gridTemplateColumns: 'repeat(auto-fill, minmax(170px, 1fr))',
          }}
        >
          {photos.map((p, index) => (
            <Box
              component="li"
              key={p.id}
              sx={{
                border: 1,
                borderColor: 'divider',
                borderRadius: 1,
                overflow: 'hidden',
                bgcolor: 'background.paper',
              }}
            >
              <ButtonBase
                onClick={() => setViewing(index)}
                aria-label={`View ${p.fileName} full size`}
                sx={{ display: 'block', width: '100%' }}
              >
                <Box
                  component="img"
                  src={p.thumbnailUrl ?? p.contentUrl}
                  alt={p.caption || p.fileName}
                  loading="lazy"
                  sx={{ display: 'block', width: '100%', aspectRatio: '4 / 3', objectFit: 'cover', bgcolor: '#e9e6de' }}
                />
              </ButtonBase>
              <Box sx={{ px: 1, py: 0.75, display: 'flex', alignItems: 'flex-start', gap: 0.5 }}>
                <Box sx={{ flex: 1, minWidth: 0 }}>
                  <Typography
                    variant="body2"
                    title={p.fileName}
                    sx={{
                      fontWeight: 500,
                      display: '-webkit-box',
                      WebkitLineClamp: 2,
                      WebkitBoxOrient: 'vertical',
                      overflow: 'hidden',
                      overflowWrap: 'anywhere',
                    }}
                  >
                    {p.caption || p.fileName}
                  </Typography>
                  <Typography variant="caption" color="text.secondary" noWrap component="p">
                    {p.uploadedBy.name}
                  </Typography>
                  <Typography variant="caption" color="text.secondary" noWrap component="p">
                    {formatDate(p.uploadedAt)} · {formatBytes(p.size)}
                  </Typography>
                  {p.addedAfterApproval && (
                    <Typography variant="caption" color="warning.main" noWrap component="p">
                      {AFTER_APPROVAL}
                    </Typography>
                  )}
                </Box>
                <ItemActions item={p} onDelete={setDeleting} />
              </Box>
            </Box>
          ))}
        </Box>
      )}
      {files.length > 0 && (
        <List dense aria-label={`Files: ${label}`} sx={{ mt: photos.length ? 1 : 0 }}>
          {files.map((f) => (
            <ListItem key={f.id} divider secondaryAction={<ItemActions item={f} onDelete={setDeleting} />}>
              <ListItemIcon sx={{ minWidth: 36 }}>
                {f.contentType === 'application/pdf' ? <PictureAsPdfOutlined /> : <DescriptionOutlined />}
              </ListItemIcon>
              <ListItemText
                primary={
                  <Link
                    href={f.contentUrl}
                    download={f.fileName}
                    underline="hover"
                    sx={{
                      display: 'inline-block',
                      maxWidth: '100%',
                      overflow: 'hidden',
                      textOverflow: 'ellipsis',
                      verticalAlign: 'top',
                      lineHeight: { xs: '44px', md: 'inherit' },
                    }}
                  >
                    {f.fileName}
                  </Link>
                }
                secondary={[f.caption, meta(f)].filter(Boolean).join(' · ')}
                slotProps={{ primary: { noWrap: true }, secondary: { noWrap: true } }}
                sx={{ pr: 6 }}
              />
            </ListItem>
          ))}
        </List>
      )}
      <EvidenceViewer photos={photos} index={viewing} onIndex={setViewing} />
      <DeleteEvidenceDialog item={deleting} onClose={() => setDeleting(null)} />
    </Box>
  );
}

function ItemActions({ item, onDelete }: { item: Evidence; onDelete: (item: Evidence) => void }) {
  if (item.locked) {
    return (
      <Tooltip title={LOCKED_HINT}>
        <LockOutlined fontSize="small" color="action" aria-label={LOCKED_HINT} sx={{ m: 0.5 }} />
      </Tooltip>
    );
  }
  if (!item.canDelete) return null;
  return (
    <IconButton size="small" edge="end" aria-label={`Delete ${item.fileName}`} onClick={() => onDelete(item)}>
      <DeleteOutline fontSize="small" />
    </IconButton>
  );
}
