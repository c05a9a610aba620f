// Where each books resource lives in our API (usable on the server and in the browser).

export const booksPaths = (slug: string) => {
  const root = `/api/workshops/${encodeURIComponent(slug)}/books`;
  return {
    ledger: (query: string) => `${root}/ledger${query ? `?${query}` : ""}`,
    ledgerExport: (query: string) => `${root}/ledger/export${query ? `?${query}` : ""}`,
    ledgerOptions: `${root}/ledger/options`,
    period: (month: string) => `${root}/reconciliation/${month}`,
    run: (month: string) => `${root}/reconciliation/${month}/run`,
    lock: (month: string) => `${root}/reconciliation/${month}/lock`,
    resolve: (month: string, id: number) => `${root}/reconciliation/${month}/exceptions/${id}/resolve`,
    review: (month: string, id: number) => `${root}/reconciliation/${month}/changes/${id}/review`,
    periodExport: (month: string) => `${root}/reconciliation/${month}/export`,
  };
};
