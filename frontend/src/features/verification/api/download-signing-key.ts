/** GET /api/public/signing-key — the server's public key (PEM), offered as a download link. */
export const signingKeyUrl = '/api/public/signing-key';
