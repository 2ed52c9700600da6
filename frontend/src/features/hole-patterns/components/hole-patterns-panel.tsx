import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { Alert, Button, Card, CardActions, CardContent, Grid, Link, Stack, Typography } from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import { paths } from '../../../config/paths';
import { EmptyState } from '../../../components/states/empty-state';
import { ErrorState } from '../../../components/states/error-state';
import { LoadingState } from '../../../components/states/loading-state';
import { useMe } from '../../../lib/session/get-me';
import { canRecord } from '../../../lib/session/roles';
import { useCreateHolePattern } from '../api/create-hole-pattern';
import { useHolePatterns } from '../api/get-hole-patterns';
import { useRailsForTemplates } from '../api/get-rails-for-templates';
import { patternTemplateUrl, railTemplateUrl } from '../api/template-links';
import { REFERENCE_LABELS } from '../types';
import { usePaper } from '../utils/use-paper';
import { PatternDialog } from './pattern-dialog';
import { PatternDrawing } from './pattern-drawing';
import { TemplateLinks } from './template-links';
import { PrintAdvice } from './print-advice';

/** The machine file's Templates tab: every rail's hole layout and the machine's own patterns, ready to print at true scale. */
export function HolePatternsPanel({ machineId }: { machineId: string }) {
  const me = useMe();
  const patterns = useHolePatterns(machineId);
  const rails = useRailsForTemplates(machineId);
  const create = useCreateHolePattern(machineId);
  const [adding, setAdding] = useState(false);
  const [paper, setPaper] = usePaper();
  const recorder = canRecord(me.data?.role);

  return (
    <Stack spacing={3}>
      <PrintAdvice paper={paper} onPaper={setPaper} />
      <section aria-labelledby="rail-templates">
        <Typography variant="h3" id="rail-templates" gutterBottom>
          Rail seats
        </Typography>
        {rails.isPending && <LoadingState label="Loading rails…" />}
        {rails.isError && <ErrorState error={rails.error} onRetry={() => rails.refetch()} />}
        {rails.data?.length === 0 && (
          <Typography color="text.secondary">
            No rails yet: add them on the Rails tab and their hole layouts appear here.
          </Typography>
        )}
        <Stack spacing={1.5}>
          {rails.data?.map((r) => (
            <Card key={r.id} variant="outlined">
              <CardContent sx={{ pb: 1 }}>
                <Typography variant="h4" component="h4">
                  Rail {r.label}{' '}
                  <Typography component="span" color="text.secondary">
                    · axis {r.axis} · {r.lengthMm} mm · {r.holes.length} holes
                  </Typography>
                </Typography>
              </CardContent>
              <CardActions sx={{ px: 2, pb: 2 }}>
                <TemplateLinks
                  what={`rail ${r.label}`}
                  paper={paper}
                  pdfUrl={(p) => railTemplateUrl(r.id, 'pdf', p)}
                  svgUrl={railTemplateUrl(r.id, 'svg')}
                />
              </CardActions>
            </Card>
          ))}
        </Stack>
      </section>
      <section aria-labelledby="pattern-templates">
        <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center', mb: 1 }}>
          <Typography variant="h3" id="pattern-templates">
            Brackets and plates
          </Typography>
          {recorder && (
            <Button variant="outlined" startIcon={<AddOutlined />} onClick={() => setAdding(true)}>
              New pattern
            </Button>
          )}
        </Stack>
        {patterns.isPending && <LoadingState label="Loading patterns…" />}
        {patterns.isError && <ErrorState error={patterns.error} onRetry={() => patterns.refetch()} />}
        {patterns.data?.length === 0 && (
          <EmptyState title="No hole patterns yet">
            Enter a bracket’s or plate’s holes as a list, a grid or a bolt circle, and print its template at true scale.
          </EmptyState>
        )}
        <Grid container spacing={2}>
          {patterns.data?.map((p) => (
            <Grid key={p.id} size={{ xs: 12, sm: 6, lg: 4 }}>
              <Card variant="outlined" sx={{ height: '100%' }}>
                <CardContent>
                  <Link
                    component={RouterLink}
                    to={paths.holePattern(machineId, p.id)}
                    variant="h4"
                    sx={{ display: 'inline-flex', alignItems: 'center', minHeight: { xs: 44, md: 'auto' } }}
                  >
                    {p.name}
                  </Link>
                  <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
                    {p.widthMm} × {p.heightMm} mm · {p.holes.length} holes · reference{' '}
                    {REFERENCE_LABELS[p.reference].toLowerCase()}
                  </Typography>
                  <PatternDrawing
                    widthMm={p.widthMm}
                    heightMm={p.heightMm}
                    holes={p.holes}
                    reference={p.reference}
                    label={`Drawing of ${p.name}`}
                    maxHeight={160}
                  />
                </CardContent>
                <CardActions sx={{ px: 2, pb: 2 }}>
                  <TemplateLinks
                    what={p.name}
                    paper={paper}
                    pdfUrl={(x) => patternTemplateUrl(p.id, 'pdf', x)}
                    svgUrl={patternTemplateUrl(p.id, 'svg')}
                  />
                </CardActions>
              </Card>
            </Grid>
          ))}
        </Grid>
      </section>
      {adding && (
        <PatternDialog
          title="New hole pattern"
          saving={create.isPending}
          error={create.error}
          onClose={() => setAdding(false)}
          onSave={(input) => create.mutate(input, { onSuccess: () => setAdding(false) })}
        />
      )}
      {create.isSuccess && !adding && <Alert severity="success">Pattern saved.</Alert>}
    </Stack>
  );
}
