import { render } from '@testing-library/react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { colors } from '@/theme';

import { getAllByRole, getByText } from '../../helpers/web-queries';

/** The first family in a CSS font-family list, unquoted. */
function firstFamily(fontFamily: string): string {
  return fontFamily.split(',')[0].trim().replace(/^"|"$/g, '');
}

describe('ThemedText', () => {
  it('sets type="figure" in the monospaced face with tabular digits', () => {
    render(<ThemedText type="figure">32.5</ThemedText>);
    const { style } = getByText('32.5').props;
    expect(firstFamily(style.fontFamily)).toBe('Azeret Mono');
    expect(style.fontFamily).toContain('monospace');
    expect(style.fontVariant).toBe('tabular-nums');
  });

  it('sets body text in the sans face and the text colour by default', () => {
    render(<ThemedText>Measure the free sag first.</ThemedText>);
    const { style } = getByText('Measure the free sag first.').props;
    expect(firstFamily(style.fontFamily)).toBe('Figtree');
    expect(style.color).toBe(toRgba(colors.text));
  });

  it('uses the semi-bold face for titles and marks them as headings', () => {
    render(<ThemedText type="title">Sagwright</ThemedText>);
    const [heading] = getAllByRole('heading');
    expect(heading.type).toBe('h1');
    expect(firstFamily(heading.props.style.fontFamily)).toBe('Figtree SemiBold');
  });

  it('leaves body text out of the heading outline', () => {
    render(<ThemedText type="body">Plain text</ThemedText>);
    expect(getAllByRole('heading')).toHaveLength(0);
  });

  it('takes a colour by token name', () => {
    render(<ThemedText color="danger">Server unreachable</ThemedText>);
    expect(getByText('Server unreachable').props.style.color).toBe(toRgba(colors.danger));
  });
});

/** react-native-web writes colours as rgba(); compare in that form. */
function toRgba(hex: string): string {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));
  return `rgba(${r},${g},${b},1.00)`;
}
