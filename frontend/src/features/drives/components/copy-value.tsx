import { useState } from 'react';
import { Box, Button, Typography } from '@mui/material';
import ContentCopyOutlined from '@mui/icons-material/ContentCopyOutlined';

/** A value shown large with a button that puts it on the clipboard, ready for the controller. */
export function CopyValue({ value, unit, label }: { value: string; unit: string; label: string }) {
  const [copied, setCopied] = useState(false);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(value);
    } catch {
      // Plain http or an older browser: fall back to a hidden text area.
      const t = document.createElement('textarea');
      t.value = value;
      document.body.appendChild(t);
      t.select();
      document.execCommand('copy');
      t.remove();
    }
    setCopied(true);
    setTimeout(() => setCopied(false), 2000);
  };
  return (
    <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, flexWrap: 'wrap' }}>
      <Box>
        <Typography variant="body2" color="text.secondary">
          {label}
        </Typography>
        <Typography
          component="output"
          aria-label={label}
          sx={{ fontFamily: 'monospace', fontSize: '1.5rem', fontWeight: 600 }}
        >
          {value}
        </Typography>{' '}
        <Typography component="span" color="text.secondary">
          {unit}
        </Typography>
      </Box>
      <Button variant="outlined" size="small" startIcon={<ContentCopyOutlined />} onClick={copy}>
        {copied ? 'Copied' : 'Copy'}
      </Button>
    </Box>
  );
}
