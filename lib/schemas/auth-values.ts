// Password length limits, shown beside the fields (auth.ts builds the schemas from them and
// re-exports them). No zod here, so client components import these without bringing zod into a page's first load
// (components/forms/lazy-schema.ts loads the schemas on first use).

export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 200;
