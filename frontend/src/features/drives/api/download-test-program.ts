import { useMutation } from '@tanstack/react-query';
import { ApiError } from '../../../lib/api-client';

export type TestProgramParams = Record<string, string | number | undefined>;

function filenameOf(res: Response): string {
  // The name is quoted only when it needs to be (RFC 6266): filename="a b.nc" or filename=a-b.nc.
  const m = /filename=(?:"([^"]+)"|([^;\s]+))/.exec(res.headers.get('content-disposition') ?? '');
  return m ? (m[1] ?? m[2]) : 'test-program.nc';
}

/** Fetches the G-code as text and hands it to the browser as a file download. */
async function downloadTestProgram(
  axisId: string,
  params: TestProgramParams,
): Promise<{ filename: string; text: string }> {
  const query = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== '') query.set(k, String(v));
  let res: Response;
  try {
    res = await fetch(`/api/axes/${axisId}/test-program?${query}`, { credentials: 'same-origin' });
  } catch {
    throw new ApiError(0, 'The server could not be reached. Check the connection and try again.');
  }
  const text = await res.text();
  if (!res.ok) {
    let details: string[];
    try {
      const m = JSON.parse(text).message;
      details = Array.isArray(m) ? m.map(String) : [String(m)];
    } catch {
      details = [text];
    }
    throw new ApiError(res.status, details.join('; '), details);
  }
  const filename = filenameOf(res);
  const url = URL.createObjectURL(new Blob([text], { type: 'text/plain' }));
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
  return { filename, text };
}

export const useDownloadTestProgram = (axisId: string) =>
  useMutation({ mutationFn: (params: TestProgramParams) => downloadTestProgram(axisId, params) });
