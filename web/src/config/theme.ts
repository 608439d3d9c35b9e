import type { ThemeConfig } from 'antd';

/**
 * Swapwright visual identity: deep workshop teal on warm shop-paper, with an oxide
 * (rust) accent for highlights. Every colour, font, radius and spacing token lives here.
 */
export const palette = {
  teal900: '#0c2629',
  teal800: '#12393d',
  teal700: '#174a4f',
  teal600: '#1d6066',
  teal500: '#24777e',
  teal100: '#dcebea',
  teal50: '#eef5f4',
  oxide600: '#a4481f',
  oxide500: '#c0592a',
  oxide100: '#f6e3d8',
  brass500: '#c8963e',
  paper: '#f4f2ed',
  ink: '#1c2426',
  inkMuted: '#56646a',
  line: '#d9dcd6',
  white: '#ffffff',
  ok: '#2f7d4f',
  warn: '#b7791f',
  fail: '#b3362b',
} as const;

export const fontFamily =
  "'Source Sans 3', system-ui, -apple-system, 'Segoe UI', Roboto, 'Helvetica Neue', Arial, sans-serif";

export const spacing = { xs: 4, sm: 8, md: 16, lg: 24, xl: 32 } as const;

export const radius = { sm: 4, md: 6, lg: 10 } as const;

export const siderWidth = 232;

/** The app bar stays on top while the page scrolls. */
export const headerHeight = 56;

/** For a card the page scrolls to: it stops below the app bar, not under it. */
export const belowHeader = { scrollMarginTop: headerHeight + spacing.md } as const;

export const theme: ThemeConfig = {
  token: {
    colorPrimary: palette.teal600,
    colorInfo: palette.teal500,
    colorSuccess: palette.ok,
    colorWarning: palette.warn,
    colorError: palette.fail,
    colorLink: palette.teal600,
    colorText: palette.ink,
    colorTextSecondary: palette.inkMuted,
    colorBorder: palette.line,
    colorBorderSecondary: '#e6e7e1',
    colorBgLayout: palette.paper,
    colorBgContainer: palette.white,
    fontFamily,
    fontSize: 15,
    borderRadius: radius.md,
    borderRadiusSM: radius.sm,
    borderRadiusLG: radius.lg,
    padding: spacing.md,
    paddingLG: spacing.lg,
    margin: spacing.md,
    marginLG: spacing.lg,
    controlHeight: 36,
    wireframe: false,
  },
  components: {
    Layout: {
      siderBg: palette.teal900,
      headerBg: palette.white,
      headerHeight,
      headerPadding: `0 ${spacing.lg}px`,
      bodyBg: palette.paper,
      footerBg: palette.paper,
      footerPadding: `${spacing.md}px ${spacing.lg}px`,
    },
    Menu: {
      darkItemBg: palette.teal900,
      darkSubMenuItemBg: palette.teal900,
      darkItemColor: '#b9cfcd',
      darkItemHoverColor: palette.white,
      darkItemSelectedBg: palette.teal700,
      darkItemSelectedColor: palette.white,
      itemBorderRadius: radius.sm,
      itemHeight: 40,
    },
    Button: {
      fontWeight: 600,
      primaryShadow: 'none',
    },
    Table: {
      headerBg: palette.teal50,
      headerColor: palette.teal800,
      headerSortActiveBg: palette.teal100,
      rowHoverBg: '#f6faf9',
    },
    Card: {
      headerFontSize: 16,
    },
    Tag: {
      defaultBg: palette.teal50,
    },
    // An information notice is calm: the lightest teal with a teal icon, so it never reads as a warning or an error
    // (the tints antd derives from the teal are grey-green and heavy).
    Alert: {
      colorInfoBg: palette.teal50,
      colorInfoBorder: palette.teal100,
    },
  },
};

/**
 * Below antd's md breakpoint (768 px) the app is used with a thumb: every control, small ones included, is at least
 * 40 CSS px high. Source: W3C WCAG 2.2, Success Criterion 2.5.5 Target Size (Enhanced), 44 x 44 CSS px; Apple Human
 * Interface Guidelines, 44 x 44 pt. 40 px for a small control is the floor we hold (Common practice (no published
 * source)), 44 px for a normal one.
 */
export const phoneControlHeights = { small: 40, middle: 44, large: 48 } as const;

export const phoneTheme: ThemeConfig = {
  ...theme,
  token: {
    ...theme.token,
    controlHeightSM: phoneControlHeights.small,
    controlHeight: phoneControlHeights.middle,
    controlHeightLG: phoneControlHeights.large,
  },
};
