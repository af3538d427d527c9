/** The three ways of supporting a shaft that shaftwise compares, in its fixed order. */
export const OPTIONS = ['bushing', 'rolling', 'journal'] as const;
export type OptionName = (typeof OPTIONS)[number];
