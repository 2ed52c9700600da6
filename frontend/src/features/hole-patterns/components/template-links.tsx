import { Button, MenuItem, Stack, TextField } from '@mui/material';
import PrintOutlined from '@mui/icons-material/PrintOutlined';
import type { Paper } from '../types';

interface Props {
  pdfUrl: (paper: Paper) => string;
  svgUrl: string;
  paper: Paper;
  onPaper?: (paper: Paper) => void;
  what: string;
}

/** "Print template (PDF)" and "SVG" for one pattern or rail, with the paper to tile over. */
export function TemplateLinks({ pdfUrl, svgUrl, paper, onPaper, what }: Props) {
  return (
    <Stack direction="row" spacing={1} useFlexGap sx={{ flexWrap: 'wrap', alignItems: 'center' }}>
      {onPaper && (
        <TextField
          select
          size="small"
          label="Paper"
          value={paper}
          onChange={(e) => onPaper(e.target.value as Paper)}
          sx={{ minWidth: 110 }}
        >
          <MenuItem value="a4">A4</MenuItem>
          <MenuItem value="letter">Letter</MenuItem>
        </TextField>
      )}
      <Button
        variant="contained"
        startIcon={<PrintOutlined />}
        href={pdfUrl(paper)}
        target="_blank"
        rel="noopener"
        aria-label={`Print template (PDF) of ${what}`}
      >
        Print template (PDF)
      </Button>
      <Button variant="outlined" href={svgUrl} target="_blank" rel="noopener" aria-label={`Template SVG of ${what}`}>
        SVG
      </Button>
    </Stack>
  );
}
