import {
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  IconButton,
  Typography,
  useMediaQuery,
  useTheme,
} from '@mui/material';
import ChevronLeft from '@mui/icons-material/ChevronLeft';
import ChevronRight from '@mui/icons-material/ChevronRight';
import Close from '@mui/icons-material/Close';
import type { Evidence } from '../types';
import { evidenceMeta as meta } from '../utils/evidence-meta';

/** The full-size photo, with its caption and the way to the original file. */
export function EvidenceViewer({
  photos,
  index,
  onIndex,
}: {
  photos: Evidence[];
  index: number | null;
  onIndex: (i: number | null) => void;
}) {
  const theme = useTheme();
  const small = useMediaQuery(theme.breakpoints.down('md'));
  const photo = index === null ? null : photos[index];
  const step = (by: number) => index !== null && onIndex((index + by + photos.length) % photos.length);

  return (
    <Dialog
      open={!!photo}
      onClose={() => onIndex(null)}
      fullScreen={small}
      maxWidth="lg"
      fullWidth
      aria-labelledby="evidence-viewer-title"
      onKeyDown={(e) => {
        if (e.key === 'ArrowRight') step(1);
        if (e.key === 'ArrowLeft') step(-1);
      }}
    >
      {photo && (
        <>
          <DialogTitle id="evidence-viewer-title" sx={{ pr: 7, overflowWrap: 'anywhere' }}>
            {photo.caption || photo.fileName}
            <Typography variant="body2" color="text.secondary" component="span" sx={{ display: 'block' }}>
              {photo.subject.label} · {photo.fileName}
              {photo.widthPx && photo.heightPx ? ` · ${photo.widthPx} × ${photo.heightPx} px` : ''}
            </Typography>
            <IconButton
              aria-label="Close"
              onClick={() => onIndex(null)}
              sx={{ position: 'absolute', right: 8, top: 8 }}
            >
              <Close />
            </IconButton>
          </DialogTitle>
          <DialogContent
            dividers
            sx={{
              p: 0,
              bgcolor: '#1b2220',
              display: 'flex',
              alignItems: 'center',
              justifyContent: 'center',
              minHeight: 240,
            }}
          >
            <Box
              component="img"
              src={photo.contentUrl}
              alt={`Full size: ${photo.caption || photo.fileName}`}
              sx={{
                display: 'block',
                maxWidth: '100%',
                maxHeight: small ? 'calc(100vh - 200px)' : '72vh',
                objectFit: 'contain',
              }}
            />
          </DialogContent>
          <DialogActions sx={{ flexWrap: 'wrap', gap: 1 }}>
            <Typography variant="body2" color="text.secondary" sx={{ flex: '1 1 200px', pl: 1 }}>
              {meta(photo)}
            </Typography>
            {photos.length > 1 && (
              <>
                <Button startIcon={<ChevronLeft />} onClick={() => step(-1)}>
                  Previous
                </Button>
                <Button endIcon={<ChevronRight />} onClick={() => step(1)}>
                  Next
                </Button>
              </>
            )}
            <Button href={photo.contentUrl} target="_blank" rel="noopener">
              Open original
            </Button>
          </DialogActions>
        </>
      )}
    </Dialog>
  );
}
