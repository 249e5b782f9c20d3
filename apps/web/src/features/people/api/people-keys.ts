export const peopleKeys = {
  all: ['users'] as const,
  pages: () => ['users', 'page'] as const,
};
