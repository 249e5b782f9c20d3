export const peopleKeys = {
  all: ['users'] as const,
  list: () => ['users', 'list'] as const,
};
