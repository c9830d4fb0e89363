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
