import { presetPalettes } from '@ant-design/colors';
import { readability } from '@ctrl/tinycolor';
import type { ThemeConfig } from 'ant-design-vue/es/config-provider/context';

/** Kerfmark's own palette: deep teal for action, warm sand for highlights, calm greys. */
export const palette = {
  teal: '#1d5c63',
  tealDark: '#144247',
  sand: '#e0b366',
  ink: '#1f2a2e',
  muted: '#5b6b70',
  paper: '#f4f6f5',
  line: '#dfe5e3',
  danger: '#b4423a',
  success: '#3f7d4e',
};

// WCAG 2.1 AA asks 4.5:1 for text (tinycolor's readability is WCAG's contrast ratio); a little over it keeps rounding on the safe side.
const READABLE = 4.6;

/**
 * The text colour of each preset tag: ant-design draws it in shade 7 on shade 1 of the colour,
 * which is under 4.5:1 for most colours; this takes the first shade from 7 on that reaches it.
 */
// ant-design's pink is its magenta by another name.
const tagPalettes = { ...presetPalettes, pink: presetPalettes.magenta! };
export const tagTextColours: Record<string, string> = Object.fromEntries(
  Object.entries(tagPalettes).map(([name, shades]) => {
    const background = shades[0]!;
    const text = shades.slice(6).find((shade) => readability(shade, background) >= READABLE) ?? shades[9]!;
    return [`${name}-7`, text];
  }),
);

export const theme: ThemeConfig = {
  token: {
    fontFamily: "'Work Sans', system-ui, -apple-system, 'Segoe UI', sans-serif",
    colorPrimary: palette.teal,
    colorLink: palette.teal,
    colorError: palette.danger,
    colorSuccess: palette.success,
    colorWarning: '#b7791f',
    colorText: palette.ink,
    colorTextSecondary: palette.muted,
    // ant-design's 45 % black (3.4:1 on white) for descriptions and titles of waiting steps is too faint.
    colorTextTertiary: palette.muted,
    colorTextDescription: palette.muted,
    colorTextPlaceholder: '#667377',
    // Read-only fields (an estimator's view of the rate card) stay readable: 4.9:1 on the disabled grey.
    colorTextDisabled: '#6b6b6b',
    ...tagTextColours,
    colorBgLayout: palette.paper,
    colorBorderSecondary: palette.line,
    borderRadius: 6,
    fontSize: 14,
  },
  components: {
    Layout: { colorBgHeader: '#ffffff', colorBgTrigger: palette.tealDark },
    Menu: { colorItemBgSelected: '#e6efee', colorItemTextSelected: palette.teal },
  },
};
