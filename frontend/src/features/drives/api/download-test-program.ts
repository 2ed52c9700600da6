import { useMutation } from '@tanstack/react-query';
import { client } from '../../../lib/api-client';
import type { paths } from '../../../lib/api/schema';

/** The program's settings as the description lists them; left out, the server's defaults. */
export type TestProgramParams = paths['/api/axes/{id}/test-program']['get']['parameters']['query'];

function filenameOf(res: Response): string {
  // The name is quoted only when it needs to be (RFC 6266): filename="a b.nc" or filename=a-b.nc.
  const m = /filename=(?:"([^"]+)"|([^;\s]+))/.exec(res.headers.get('content-disposition') ?? '');
  return m ? (m[1] ?? m[2]) : 'test-program.nc';
}

/** Fetches the G-code as text and hands it to the browser as a file download. */
async function downloadTestProgram(
  axisId: string,
  query: TestProgramParams,
): Promise<{ filename: string; text: string }> {
  // A refusal or a lost connection is thrown as ApiError by the client, as for every other call.
  const { data, response } = await client.GET('/api/axes/{id}/test-program', {
    params: { path: { id: axisId }, query },
    parseAs: 'text',
    headers: { Accept: 'text/plain' },
  });
  const text = data ?? '';
  const filename = filenameOf(response);
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
