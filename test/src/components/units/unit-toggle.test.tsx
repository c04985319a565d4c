/**
 * Check values: NIST SP 811 (2008), appendix B.8: 1 in = 25.4 mm exactly; 1 lbf/in = 0.1751268 N/mm;
 * 1 kgf/mm = 9.80665 N/mm exactly.
 */
import { fireEvent, render, screen } from '@testing-library/react-native';

import { Quantity } from '@/components/units/quantity';
import { UnitToggle } from '@/components/units/unit-toggle';
import { toDisplayUnits } from '@shared/garage/units';

import { answerBy, installFakeFetch, respond } from '../../helpers/fake-fetch';
import { TestSWR } from '../../helpers/swr';

const { fetchMock } = installFakeFetch();

function renderFigures() {
  return render(
    <TestSWR>
      <UnitToggle />
      <Quantity value={254} kind="length" testID="length" />
      <Quantity value={17.51268} kind="rate" testID="rate" />
    </TestSWR>,
  );
}

describe('the unit toggle', () => {
  it('shows the same SI values in mm and N/mm, then in inches and lbf/in, then kgf/mm', async () => {
    const sent: unknown[] = [];
    let stored = toDisplayUnits({ system: 'metric', rateUnit: 'N/mm' });
    fetchMock.mockImplementation(
      answerBy({
        'GET /api/me/units': () => respond(200, { units: stored }),
        'PUT /api/me/units': (init) => {
          const body = JSON.parse(String(init.body));
          sent.push(body);
          stored = toDisplayUnits(body);
          return respond(200, { units: stored });
        },
      }),
    );
    renderFigures();
    expect(await screen.findByText('254 mm')).toBeTruthy();
    expect(screen.getByTestId('rate')).toHaveTextContent('17.5 N/mm');

    fireEvent.press(screen.getByRole('radio', { name: 'in · lb' }));
    expect(await screen.findByText('10 in')).toBeTruthy();
    expect(screen.getByTestId('rate')).toHaveTextContent('100 lbf/in');
    expect(sent).toEqual([{ system: 'imperial', rateUnit: 'lbf/in' }]);

    fireEvent.press(screen.getByRole('radio', { name: 'kgf/mm' }));
    // 17.51268 / 9.80665 = 1.7858 kgf/mm.
    expect(await screen.findByText('1.79 kgf/mm')).toBeTruthy();
    expect(screen.getByTestId('length')).toHaveTextContent('10 in');
  });
});
