/** GET /api/public/verify/:token/record.json — the signed record with its signature, offered as a download link. */
export const signedRecordUrl = (token: string) => `/api/public/verify/${encodeURIComponent(token)}/record.json`;
