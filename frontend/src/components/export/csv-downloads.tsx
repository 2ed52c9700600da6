import { useState } from 'react';
import { Button, ListItemText, Menu, MenuItem } from '@mui/material';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';

export interface CsvFile {
  /** What the file holds, e.g. "Sweeps of rail Y1". */
  label: string;
  /** The server's CSV route, e.g. /api/rails/…/sweeps.csv. */
  href: string;
}

/**
 * "Download CSV": a plain link for one file, a short menu for several. The server writes the
 * files (units in the headers, times in ISO 8601 UTC), so a download is an ordinary link.
 */
export function CsvDownloads({
  files,
  text = 'Download CSV',
}: {
  files: CsvFile[];
  /** The button's words, where "Download CSV" alone would not say which records. */ text?: string;
}) {
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  if (files.length === 1) {
    return (
      <Button
        variant="outlined"
        startIcon={<FileDownloadOutlined />}
        href={files[0].href}
        download
        aria-label={`Download CSV: ${files[0].label}`}
      >
        {text}
      </Button>
    );
  }
  return (
    <>
      <Button
        variant="outlined"
        startIcon={<FileDownloadOutlined />}
        onClick={(e) => setAnchor(e.currentTarget)}
        aria-haspopup="menu"
        aria-expanded={!!anchor}
      >
        {text}
      </Button>
      <Menu anchorEl={anchor} open={!!anchor} onClose={() => setAnchor(null)}>
        {files.map((f) => (
          <MenuItem key={f.href} component="a" href={f.href} download onClick={() => setAnchor(null)}>
            <ListItemText primary={f.label} />
          </MenuItem>
        ))}
      </Menu>
    </>
  );
}
