/** Query keys of the designer's endpoints; mutations invalidate through these. */
export const methodDesignKeys = {
  all: ['method-designs'] as const,
  list: () => [...methodDesignKeys.all, 'list'] as const,
  design: (slug: string) => [...methodDesignKeys.all, slug] as const,
  draft: (slug: string) => [...methodDesignKeys.design(slug), 'draft'] as const,
  versions: (slug: string) => [...methodDesignKeys.design(slug), 'versions'] as const,
  version: (slug: string, version: number) => [...methodDesignKeys.versions(slug), version] as const,
  compare: (slug: string, from: string, to: string) => [...methodDesignKeys.design(slug), 'compare', from, to] as const,
};

export const methodDesignPath = (slug: string) => `/api/method-designs/${encodeURIComponent(slug)}`;
