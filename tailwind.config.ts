import type { Config } from "tailwindcss";

/**
 * Eavesight design tokens.
 *
 * Contrast was checked pair by pair (WCAG 2.x relative luminance):
 * - ink-900 on white 17.1:1 and on ink-50 15.8:1 (body text, AAA)
 * - ink-600 on white 7.7:1 (secondary text, AAA)
 * - white on ember-600 5.3:1, on ember-700 7.2:1 (primary buttons, AA / AAA)
 * - each status 800 shade on its 50 tint ≥ 8.6:1 (status text, AAA)
 * - ink-400 on white 3.5:1 (control borders, ≥ 3:1 non-text)
 * Status colours are never used alone: SeverityBadge always pairs an icon and a word.
 */
export default {
  content: ["./index.html", "./src/**/*.{ts,tsx}"],
  theme: {
    colors: {
      transparent: "transparent",
      current: "currentColor",
      white: "#FFFFFF",
      black: "#000000",
      // Slate-ink neutrals, a cool blue-grey that holds up under a headlamp and in full sun.
      ink: {
        25: "#F9FAFB",
        50: "#F4F6F8",
        100: "#E6E9EE",
        200: "#CDD3DB",
        300: "#AAB3BF",
        400: "#7F8A99",
        500: "#5E6977",
        600: "#4A5462",
        700: "#363F4B",
        800: "#252C36",
        900: "#171C24",
        950: "#0D1117",
      },
      // Ember: the warm brand signal (a fired-clay orange), for primary actions and the mark.
      ember: {
        50: "#FFF4EC",
        100: "#FFE4D1",
        200: "#FCC8A3",
        300: "#F6A06B",
        400: "#EE7C3C",
        500: "#DD6020",
        600: "#B8470F",
        700: "#973A0C",
        800: "#76300F",
        900: "#5A250E",
      },
      critical: {
        50: "#FDF1F1",
        100: "#FADCDC",
        200: "#F3B5B5",
        500: "#D43B3B",
        600: "#B42323",
        700: "#951C1C",
        800: "#7A1818",
        900: "#4F1212",
      },
      warning: {
        50: "#FEF6E0",
        100: "#FCEBC0",
        200: "#F5D485",
        500: "#D19A12",
        600: "#9E6C00",
        700: "#7D5500",
        800: "#5E3F00",
        900: "#402B00",
      },
      info: {
        50: "#EEF4FD",
        100: "#D8E6FA",
        200: "#B0CCF3",
        500: "#3A78D6",
        600: "#1F5FBF",
        700: "#1A4E9C",
        800: "#16407E",
        900: "#102D59",
      },
      ok: {
        50: "#ECF7F0",
        100: "#D3EEDD",
        200: "#A6DCBA",
        500: "#2E9A5C",
        600: "#1E7A45",
        700: "#186338",
        800: "#14502E",
        900: "#0E3720",
      },
      // Keyboard focus ring: one colour everywhere, 6.1:1 on white.
      focus: "#1F5FBF",
    },
    fontFamily: {
      sans: [
        '"IBM Plex Sans"',
        "system-ui",
        "-apple-system",
        '"Segoe UI"',
        "Roboto",
        "sans-serif",
      ],
    },
    // Our type scale: a 17 px body so readings stay legible at arm's length on a phone.
    fontSize: {
      "2xs": ["0.75rem", { lineHeight: "1rem" }],
      xs: ["0.8125rem", { lineHeight: "1.25rem" }],
      sm: ["0.9375rem", { lineHeight: "1.375rem" }],
      base: ["1.0625rem", { lineHeight: "1.625rem" }],
      lg: ["1.1875rem", { lineHeight: "1.75rem" }],
      xl: ["1.375rem", { lineHeight: "1.875rem" }],
      "2xl": ["1.625rem", { lineHeight: "2.125rem" }],
      "3xl": ["2rem", { lineHeight: "2.5rem" }],
      "4xl": ["2.5rem", { lineHeight: "3rem" }],
    },
    extend: {
      spacing: {
        // Minimum touch target (WCAG 2.5.5 asks 44 × 44 CSS px).
        touch: "2.75rem",
        "touch-lg": "3.25rem",
        // Height of the phone bottom navigation bar.
        bar: "4.25rem",
      },
      maxWidth: {
        content: "76rem",
        form: "32rem",
        reading: "44rem",
      },
      borderRadius: {
        sm: "0.25rem",
        DEFAULT: "0.375rem",
        md: "0.5rem",
        lg: "0.75rem",
        xl: "1rem",
      },
      boxShadow: {
        card: "0 1px 2px rgb(13 17 23 / 0.06), 0 1px 1px rgb(13 17 23 / 0.04)",
        raised: "0 8px 24px rgb(13 17 23 / 0.12), 0 2px 6px rgb(13 17 23 / 0.08)",
      },
    },
  },
} satisfies Config;
