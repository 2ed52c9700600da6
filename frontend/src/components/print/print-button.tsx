import { Button } from '@mui/material';
import PrintOutlined from '@mui/icons-material/PrintOutlined';

/** Prints the page as it is laid out for paper (see print-styles.tsx). */
export function PrintButton({ what }: { what: string }) {
  return (
    <Button
      variant="outlined"
      startIcon={<PrintOutlined />}
      onClick={() => window.print()}
      aria-label={`Print ${what}`}
    >
      Print
    </Button>
  );
}
