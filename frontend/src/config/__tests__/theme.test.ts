// @vitest-environment node
import { theme as antdTheme } from 'antd';
import { describe, expect, it } from 'vitest';
import { caution, theme } from '@/config/theme';

function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => {
    const c = Number.parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

function contrast(a: string, b: string): number {
  const [light, dark] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (light + 0.05) / (dark + 0.05);
}

describe('theme', () => {
  const token = antdTheme.getDesignToken(theme);

  it('keeps text at WCAG 2.1 AA contrast (4.5:1)', () => {
    const pairs: [string, string, string][] = [
      ['white on primary', '#ffffff', token.colorPrimary],
      ['white on primary hover', '#ffffff', token.colorPrimaryHover],
      ['white on primary active', '#ffffff', token.colorPrimaryActive],
      ['link on white', token.colorLink, '#ffffff'],
      ['link on layout', token.colorLink, token.colorBgLayout],
      ['primary text on selected item', token.colorPrimaryText, token.colorPrimaryBg],
      ['text on layout', token.colorText, token.colorBgLayout],
      ['secondary text', token.colorTextSecondary, '#ffffff'],
      ['tertiary text', token.colorTextTertiary, '#ffffff'],
      ['placeholder', token.colorTextPlaceholder, '#ffffff'],
      ['error text', token.colorError, '#ffffff'],
      ['success text', token.colorSuccess, '#ffffff'],
      ['caution title', caution.text, caution.background],
    ];
    for (const [name, fg, bg] of pairs) {
      expect(contrast(fg, bg), name).toBeGreaterThanOrEqual(4.5);
    }
  });

  it('keeps amber for safety cautions only, with a visible accent', () => {
    expect(token.colorWarning.toLowerCase()).not.toBe(caution.accent);
    expect(contrast(caution.accent, '#ffffff')).toBeGreaterThanOrEqual(3);
  });

  it('uses Source Sans 3, a generous line height and large touch targets', () => {
    expect(token.fontFamily).toMatch(/^'Source Sans 3'/);
    expect(token.lineHeight).toBeCloseTo(1.6);
    expect(token.controlHeight).toBeGreaterThanOrEqual(44);
  });
});
