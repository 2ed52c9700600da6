import { useRef, useState, type DragEvent } from 'react';
import { Box, Button, Paper, TextField, Typography } from '@mui/material';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import { useEvidenceLimits } from '../api/get-evidence-limits';
import { useUploadQueue } from '../hooks/use-upload-queue';
import { ACCEPT_ATTRIBUTE, type EvidenceSubject } from '../types';
import { formatBytes } from '../utils/format-bytes';
import { UploadList } from './upload-list';

const MAX_CAPTION = 500;

/** The caption typed and the files just chosen, dropped or photographed; at least one file goes. */
const evidenceUploadFormSchema = z.object({
  caption: z.string().max(MAX_CAPTION),
  files: z.array(z.instanceof(File)).min(1),
});

type EvidenceUploadFormValues = z.input<typeof evidenceUploadFormSchema>;

const emptyEvidenceUploadForm: EvidenceUploadFormValues = { caption: '', files: [] };

/** Drop zone, file picker and phone camera; each file is sent on its own with its own progress. */
export function EvidenceUploader({ subject, what }: { subject: EvidenceSubject; what?: string }) {
  const limits = useEvidenceLimits();
  const queue = useUploadQueue(subject, limits.data);
  const form = useForm<EvidenceUploadFormValues>({
    defaultValues: emptyEvidenceUploadForm,
    resolver: zodResolver(evidenceUploadFormSchema),
  });
  const [over, setOver] = useState(false);
  const picker = useRef<HTMLInputElement>(null);
  const camera = useRef<HTMLInputElement>(null);

  // The files are sent as soon as they are chosen; the caption stays for the next ones.
  const send = form.handleSubmit(({ files, caption }) => {
    queue.add(files, caption);
    form.setValue('files', []);
  });
  const take = (list: FileList | null) => {
    // Copied now: the input is emptied right after, so the same file can be chosen again.
    form.setValue('files', list ? Array.from(list) : []);
    void send();
  };
  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    take(e.dataTransfer.files);
  };
  const types = limits.data?.accepted.map((t) => t.label).join(', ') ?? 'JPEG, PNG, WebP, PDF or CSV';
  const max = limits.data ? ` up to ${formatBytes(limits.data.maxBytes)} each` : '';

  return (
    <Box>
      <Paper
        role="group"
        aria-label={`Attach photos or files${what ? ` to ${what}` : ''}`}
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={onDrop}
        sx={{
          p: 2,
          border: '2px dashed',
          borderColor: over ? 'primary.main' : 'divider',
          bgcolor: over ? 'rgba(29, 79, 74, 0.06)' : 'background.paper',
          display: 'flex',
          flexWrap: 'wrap',
          alignItems: 'center',
          gap: 2,
        }}
      >
        <Box sx={{ flex: '1 1 260px', minWidth: 0 }}>
          <Typography sx={{ fontWeight: 500 }}>Drop photos or files here</Typography>
          <Typography variant="body2" color="text.secondary">
            {types}
            {max}. Several at once is fine.
          </Typography>
        </Box>
        <Controller
          name="caption"
          control={form.control}
          render={({ field }) => (
            <TextField
              label="Caption (optional)"
              name={field.name}
              value={field.value}
              // Cut at the limit as typed or pasted rather than refused later: the caption is optional.
              onChange={(e) => field.onChange(e.target.value.slice(0, MAX_CAPTION))}
              onBlur={field.onBlur}
              inputRef={field.ref}
              helperText="Given to the files you add next"
              sx={{ flex: '1 1 220px' }}
            />
          )}
        />
        <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
          <Button variant="contained" startIcon={<CloudUploadOutlined />} onClick={() => picker.current?.click()}>
            Choose files
          </Button>
          <Button variant="outlined" startIcon={<PhotoCameraOutlined />} onClick={() => camera.current?.click()}>
            Use camera
          </Button>
        </Box>
        <input
          ref={picker}
          type="file"
          multiple
          accept={ACCEPT_ATTRIBUTE}
          aria-label="Choose photos or files"
          hidden
          onChange={(e) => {
            take(e.target.files);
            e.target.value = '';
          }}
        />
        <input
          ref={camera}
          type="file"
          accept="image/*"
          capture="environment"
          aria-label="Take a photo with the camera"
          hidden
          onChange={(e) => {
            take(e.target.files);
            e.target.value = '';
          }}
        />
      </Paper>
      <UploadList
        items={queue.items}
        onCancel={queue.cancel}
        onDismiss={queue.dismiss}
        onClearFinished={queue.clearFinished}
      />
    </Box>
  );
}
