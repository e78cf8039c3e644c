/** Colours, spacing and sizes used across the app: one place to tune the look. */
export const colors = {
  background: "#F6F3EE",
  surface: "#FFFFFF",
  ink: "#1F2328",
  muted: "#5C6166",
  line: "#DDD6CC",
  accent: "#A8481F",
  accentInk: "#FFFFFF",
  steel: "#2F5D62",
  danger: "#B42318",
  dangerBg: "#FDECEA",
  /** Dark amber: "needs rework" and other cautions in text, readable on white and on the paper. */
  caution: "#8A6100",
  cautionBg: "#FFF4D6",
};

/** How a casting came out, one colour each wherever it shows (a casting's row, a casebook card). */
export const outcomeColours = { good: colors.steel, rework: colors.caution, scrap: colors.danger } as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;
export const radius = { sm: 6, md: 10 } as const;

/** Screens this wide or wider get the side rail and a centred column. */
export const WIDE_MIN_PX = 900;
export const CONTENT_MAX_PX = 760;
/** Tables and two-pane pages (a photo beside its marks) on wide screens. */
export const WIDE_CONTENT_MAX_PX = 1040;

export const fonts = { heading: "Lora-SemiBold", serif: "Lora-Regular" } as const;

/**
 * The type scale: every text size in the app is one of these. `body` is running text and form
 * values (16 keeps mobile browsers from zooming into a field), `detail` the secondary lines.
 */
export const fontSize = { small: 13, detail: 14, body: 15, field: 16, lead: 17, title: 20, display: 26 } as const;

/** The white card on the paper background: lists, forms and panels share it. */
/** The box a person types into: text, numbers, dates and search fields share it. */
export const fieldBox = {
  minHeight: 44,
  borderWidth: 1,
  borderColor: colors.line,
  borderRadius: radius.sm,
  paddingHorizontal: space.md,
  fontSize: fontSize.field,
  backgroundColor: colors.surface,
  color: colors.ink,
} as const;

export const card = {
  backgroundColor: colors.surface,
  borderRadius: radius.md,
  borderWidth: 1,
  borderColor: colors.line,
} as const;
