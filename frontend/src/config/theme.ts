import type { ThemeConfig } from 'antd';

/**
 * Causeway's own palette. The primary is a deep teal; amber is kept for safety cautions
 * alone, so antd's generic "warning" colour is a neutral slate and never competes with it.
 * Every text/background pair used here meets WCAG 2.1 AA (4.5:1); see theme.test.ts.
 */
export const palette = {
  teal50: '#eef6f5',
  teal100: '#d5e9e7',
  teal200: '#a8d0cc',
  teal300: '#74b2ad',
  teal500: '#16747a',
  teal600: '#0f5e63',
  teal700: '#0a474b',
  teal900: '#06302f',
  grey50: '#f5f7f7',
  grey100: '#eceff0',
  grey200: '#dde2e3',
  grey300: '#c5cccf',
  grey600: '#5f6670',
  grey700: '#454c54',
  grey900: '#1f2328',
  slate: '#55606a',
  red: '#b3261e',
  green: '#2f7a3b',
  white: '#ffffff',
} as const;

/** Amber is reserved for safety cautions (see components/safety-caution.tsx). */
export const caution = {
  /** Icon and border: 4.2:1 on white, above the 3:1 needed for non-text elements. */
  accent: '#b26a00',
  background: '#fff6e5',
  border: '#e8c48a',
  /** Title text: 7.2:1 on the caution background. */
  text: '#7a4700',
} as const;

export const fontFamily =
  "'Source Sans 3', system-ui, -apple-system, 'Segoe UI', Roboto, 'Helvetica Neue', Arial, sans-serif";

export const theme: ThemeConfig = {
  token: {
    fontFamily,
    fontSize: 16,
    lineHeight: 1.6,
    borderRadius: 6,
    // Tablets on the bench, gloved hands: large targets everywhere.
    controlHeight: 44,
    controlHeightSM: 36,
    controlHeightLG: 52,

    colorPrimary: palette.teal600,
    // antd derives these from the seed, but a seed this dark gives muddy tints; set them.
    colorPrimaryHover: palette.teal500,
    colorPrimaryActive: palette.teal700,
    colorPrimaryBg: palette.teal50,
    colorPrimaryBgHover: palette.teal100,
    colorPrimaryBorder: palette.teal200,
    colorPrimaryBorderHover: palette.teal300,
    colorPrimaryText: palette.teal600,
    colorPrimaryTextHover: palette.teal500,
    colorPrimaryTextActive: palette.teal700,
    colorLink: palette.teal600,
    colorLinkHover: palette.teal500,
    colorLinkActive: palette.teal700,

    colorInfo: palette.teal600,
    colorInfoBg: palette.teal50,
    colorInfoBorder: palette.teal200,
    colorSuccess: palette.green,
    colorError: palette.red,
    colorWarning: palette.slate,

    colorText: palette.grey900,
    colorTextSecondary: palette.grey700,
    colorTextTertiary: palette.grey600,
    colorTextDescription: palette.grey600,
    colorTextPlaceholder: palette.grey600,
    colorBorder: palette.grey300,
    colorBorderSecondary: palette.grey200,
    colorBgLayout: palette.grey50,
    colorBgContainer: palette.white,
    colorFillAlter: palette.grey50,
  },
  components: {
    Layout: {
      headerBg: palette.white,
      headerHeight: 64,
      headerPadding: '0 16px',
      siderBg: palette.white,
      bodyBg: palette.grey50,
    },
    Menu: {
      itemHeight: 48,
      itemSelectedBg: palette.teal50,
      itemSelectedColor: palette.teal700,
      itemHoverBg: palette.grey100,
      groupTitleColor: palette.grey600,
      activeBarBorderWidth: 0,
    },
    Table: {
      headerBg: palette.grey100,
      rowHoverBg: palette.teal50,
    },
    Tag: {
      defaultBg: palette.grey100,
      defaultColor: palette.grey900,
    },
  },
};
