import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { ApiError } from '@/api/client';
import { WalkInForm } from '@/components/quotes/walk-in-form';

type Input = { name: string; email: string };

describe('WalkInForm', () => {
  it('asks for a name and a real e-mail before it sends anything', async () => {
    const onCreate = jest.fn<Promise<unknown>, [Input]>().mockResolvedValue({});
    render(<WalkInForm onCreate={onCreate} />);
    fireEvent.press(screen.getByRole('button', { name: 'Add the customer' }));
    expect(await screen.findByText('Give the rider a name.')).toBeOnTheScreen();
    expect(screen.getByText('An e-mail is needed for the quote.')).toBeOnTheScreen();

    fireEvent.changeText(screen.getByLabelText('Customer e-mail'), 'not-an-address');
    fireEvent.press(screen.getByRole('button', { name: 'Add the customer' }));
    expect(await screen.findByText('That is not an e-mail address.')).toBeOnTheScreen();
    expect(onCreate).not.toHaveBeenCalled();
  });

  it('sends the name and the e-mail trimmed and lower-cased, as the server keeps them', async () => {
    const onCreate = jest.fn<Promise<unknown>, [Input]>().mockResolvedValue({});
    render(<WalkInForm onCreate={onCreate} />);
    fireEvent.changeText(screen.getByLabelText('Customer name'), '  Ada Walker ');
    fireEvent.changeText(screen.getByLabelText('Customer e-mail'), ' Ada@Example.TEST ');
    fireEvent.press(screen.getByRole('button', { name: 'Add the customer' }));
    await waitFor(() => expect(onCreate).toHaveBeenCalledWith({ name: 'Ada Walker', email: 'ada@example.test' }));
  });

  it('puts the server’s answer under the e-mail when the address is taken', async () => {
    const onCreate = jest
      .fn<Promise<unknown>, [Input]>()
      .mockRejectedValue(new ApiError(409, { code: 'email-taken', message: 'Taken.', fields: { email: 'An account already uses this e-mail.' } }));
    render(<WalkInForm onCreate={onCreate} />);
    fireEvent.changeText(screen.getByLabelText('Customer name'), 'Ada Walker');
    fireEvent.changeText(screen.getByLabelText('Customer e-mail'), 'ada@example.test');
    fireEvent.press(screen.getByRole('button', { name: 'Add the customer' }));
    expect(await screen.findByText('An account already uses this e-mail.')).toBeOnTheScreen();
  });
});
