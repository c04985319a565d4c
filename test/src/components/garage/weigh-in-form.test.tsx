import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { WeighInForm } from '@/components/garage/weigh-in-form';
import type { TargetProfile } from '@shared/types/sizing';

import { answerBy, installFakeFetch, respond } from '../../helpers/fake-fetch';
import { TestSWR } from '../../helpers/swr';

const { fetchMock } = installFakeFetch();

// The demo's own figures (invented): one discipline is enough for the form to offer a choice.
const profiles = [{ discipline: 'road', label: 'Road', note: 'Street riding.', front: {}, rear: {} }] as unknown as TargetProfile[];

// The rule and its message are weighInSchema's (shared/schemas/weigh-in.schema.ts): body mass 20 to 300 kg.
const RANGE_MESSAGE = 'Body mass must be between 20 and 300 kg.';

function renderForm(onSubmit = jest.fn(async () => undefined)) {
  fetchMock.mockImplementation(answerBy({ 'GET /api/me/units': respond(200, { units: { system: 'metric', rateUnit: 'N/mm', length: 'mm', mass: 'kg', force: 'N' } }) }));
  render(
    <TestSWR>
      <WeighInForm weighIn={null} profiles={profiles} submitLabel="Confirm" onSubmit={onSubmit} />
    </TestSWR>,
  );
  return onSubmit;
}

describe('WeighInForm', () => {
  it('checks a body mass when the field is left, not while it is first typed', async () => {
    renderForm();
    const body = screen.getByLabelText('Body mass (kg)');
    fireEvent.changeText(body, '5');
    await waitFor(() => expect(body).toHaveDisplayValue('5'));
    expect(screen.queryByText(RANGE_MESSAGE)).toBeNull();
    fireEvent(body, 'blur');
    expect(await screen.findByText(RANGE_MESSAGE)).toBeOnTheScreen();
  });

  it('clears a shown error as soon as the typing fixes it', async () => {
    renderForm();
    const body = screen.getByLabelText('Body mass (kg)');
    fireEvent.changeText(body, '5');
    fireEvent(body, 'blur');
    expect(await screen.findByText(RANGE_MESSAGE)).toBeOnTheScreen();
    fireEvent.changeText(screen.getByLabelText('Body mass (kg)'), '81');
    await waitFor(() => expect(screen.queryByText(RANGE_MESSAGE)).not.toBeOnTheScreen());
  });

  it('shows the error on submit and sends nothing', async () => {
    const onSubmit = renderForm();
    fireEvent.changeText(screen.getByLabelText('Body mass (kg)'), '400');
    fireEvent.press(screen.getByRole('button', { name: 'Confirm' }));
    expect(await screen.findByText(RANGE_MESSAGE)).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('sends the typed body mass in kg', async () => {
    const onSubmit = renderForm();
    fireEvent.changeText(screen.getByLabelText('Body mass (kg)'), '81');
    fireEvent.press(screen.getByRole('button', { name: 'Confirm' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledWith(expect.objectContaining({ bodyKg: 81, discipline: 'road' })));
  });
});
