import { render, screen } from '@testing-library/react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { colors, fontFaces } from '@/theme';

describe('ThemedText', () => {
  it('sets type="figure" in the monospaced face with tabular digits', () => {
    render(<ThemedText type="figure">32.5</ThemedText>);
    expect(screen.getByText('32.5')).toHaveStyle({
      fontFamily: fontFaces.mono,
      fontVariant: ['tabular-nums'],
    });
  });

  it('sets body text in the sans face and the text colour by default', () => {
    render(<ThemedText>Measure the free sag first.</ThemedText>);
    expect(screen.getByText('Measure the free sag first.')).toHaveStyle({
      fontFamily: fontFaces.sans,
      color: colors.text,
    });
  });

  it('uses the semi-bold face for titles and marks them as headers', () => {
    render(<ThemedText type="title">Sagwright</ThemedText>);
    expect(screen.getByRole('header', { name: 'Sagwright' })).toHaveStyle({
      fontFamily: fontFaces.sansSemiBold,
    });
  });

  it('leaves body text out of the heading outline', () => {
    render(<ThemedText type="body">Plain text</ThemedText>);
    expect(screen.queryAllByRole('header')).toHaveLength(0);
  });

  it('takes a colour by token name', () => {
    render(<ThemedText color="danger">Server unreachable</ThemedText>);
    expect(screen.getByText('Server unreachable')).toHaveStyle({ color: colors.danger });
  });
});
