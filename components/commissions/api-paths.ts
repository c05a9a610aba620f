// Where each commission resource lives in our API, and the TanStack Query keys that cache them.
// One place, so a screen that changes something invalidates exactly what others show.

export const commissionPaths = (slug: string) => {
  const root = `/api/workshops/${encodeURIComponent(slug)}`;
  const one = (id: number) => `${root}/commissions/${id}`;
  return {
    list: (query: string) => `${root}/commissions${query ? `?${query}` : ""}`,
    create: `${root}/commissions`,
    people: `${root}/commission-people`,
    stages: `${root}/commission-stages`,
    members: `${root}/members`,
    one,
    history: (id: number) => `${one(id)}/transitions`,
    signoff: (id: number, historyId: number) => `${one(id)}/transitions/${historyId}/signoff`,
    comments: (id: number) => `${one(id)}/comments`,
    versions: (id: number) => `${one(id)}/spec-versions`,
    version: (id: number, versionId: number) => `${one(id)}/spec-versions/${versionId}`,
    submit: (id: number, versionId: number) => `${one(id)}/spec-versions/${versionId}/submit`,
    approve: (id: number, versionId: number) => `${one(id)}/spec-versions/${versionId}/approve`,
  };
};

export const commissionKeys = {
  all: (slug: string) => ["commissions", slug] as const,
  list: (slug: string, query: string) => ["commissions", slug, "list", query] as const,
  stages: (slug: string) => ["commissions", slug, "stages"] as const,
  people: (slug: string) => ["commissions", slug, "people"] as const,
  one: (slug: string, id: number) => ["commissions", slug, "one", id] as const,
  history: (slug: string, id: number) => ["commissions", slug, "one", id, "history"] as const,
  comments: (slug: string, id: number) => ["commissions", slug, "one", id, "comments"] as const,
  versions: (slug: string, id: number) => ["commissions", slug, "one", id, "versions"] as const,
  version: (slug: string, id: number, versionId: number) => ["commissions", slug, "one", id, "versions", versionId] as const,
};
