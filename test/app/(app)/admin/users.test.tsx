import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';
import type { AccountUser, UserPage } from '@shared/types/account';

import { accountUser, sessionAnswer } from '../../../src/helpers/accounts';
import { answerBy, installFakeFetch, respond, respondError, requestsOf, type Answers } from '../../../src/helpers/fake-fetch';
import { renderApp } from '../../render-app';

let mockIsWide = true;
jest.mock('@/theme/use-layout', () => ({
  useLayout: () => ({ width: mockIsWide ? 1280 : 390, isWide: mockIsWide }),
}));

const { fetchMock } = installFakeFetch();

const admin = accountUser('admin');
const rider = accountUser('rider');
const FIRST_PAGE = 'GET /api/users?q=&page=1&pageSize=20';

function page(users: AccountUser[], total = users.length): UserPage {
  return { users, total, page: 1, pageSize: 20 };
}

/** The admin's session, the first page of the list, and whatever the test adds. */
function serve(answers: Answers = {}) {
  fetchMock.mockImplementation(
    answerBy({
      'POST /api/auth/refresh': respond(200, sessionAnswer(admin)),
      [FIRST_PAGE]: respond(200, page([admin, rider])),
      ...answers,
    }),
  );
}

async function openUsers() {
  renderApp('/admin/users');
  await screen.findByText('rider@demo.test');
}

beforeEach(() => setAuthToken(null));

describe('Users screen', () => {
  afterEach(() => {
    jest.useRealTimers();
    mockIsWide = true;
  });

  it('lays the accounts out as a table on a wide window and as cards on a phone', async () => {
    serve();
    await openUsers();
    expect(screen.getByTestId(`user-row-${rider.id}`)).toHaveTextContent(/Mara Linden.*rider@demo\.test/);
    expect(screen.queryByTestId(`user-card-${rider.id}`)).toBeNull();
    expect(screen.getByText('Page 1 of 1 · 2 accounts')).toBeOnTheScreen();

    screen.unmount();
    mockIsWide = false;
    await openUsers();
    expect(screen.getByTestId(`user-card-${rider.id}`)).toHaveTextContent(/Mara Linden/);
    expect(screen.queryByTestId(`user-row-${rider.id}`)).toBeNull();
  });

  it("changes a role and shows the list as the server now has it", async () => {
    let pages = 0;
    serve({
      [FIRST_PAGE]: () => respond(200, page([admin, ++pages === 1 ? rider : { ...rider, role: 'counter' }])),
      [`PATCH /api/users/${rider.id}/role`]: respond(200, { user: { ...rider, role: 'counter' } }),
    });
    await openUsers();
    const row = within(screen.getByTestId(`user-row-${rider.id}`));
    expect(row.getByRole('radio', { name: 'Rider' })).toBeChecked();

    fireEvent.press(row.getByRole('radio', { name: 'Counter' }));
    await waitFor(() => expect(row.getByRole('radio', { name: 'Counter' })).toBeChecked());
    const patch = fetchMock.mock.calls.find(([url]) => url === `/api/users/${rider.id}/role`)!;
    expect(JSON.parse(patch[1].body as string)).toEqual({ role: 'counter' });
    expect(requestsOf(fetchMock).filter((r) => r === FIRST_PAGE)).toHaveLength(2);
  });

  it("shows the server's refusal beside the admin's own account", async () => {
    const refusal = 'You cannot switch off your own account; another admin can.';
    serve({ [`PATCH /api/users/${admin.id}/active`]: respondError(409, 'own-account', refusal) });
    await openUsers();
    const row = within(screen.getByTestId(`user-row-${admin.id}`));
    expect(row.getByText('Ada Brennick (you)')).toBeOnTheScreen();

    fireEvent.press(row.getByRole('button', { name: 'Switch off Ada Brennick' }));
    expect(await row.findByRole('alert')).toHaveTextContent(refusal);
    expect(row.getByText('Active')).toBeOnTheScreen();
  });

  it('searches on Enter and says when nothing matches', async () => {
    serve({ 'GET /api/users?q=nobody&page=1&pageSize=20': respond(200, page([])) });
    await openUsers();
    const search = screen.getByLabelText('Search accounts');
    fireEvent.changeText(search, ' nobody ');
    fireEvent(search, 'submitEditing');
    expect(await screen.findByText('No account matches “nobody”.')).toBeOnTheScreen();
  });

  it('says what went wrong when the list cannot be loaded, and loads it again on request', async () => {
    let pages = 0;
    serve({
      [FIRST_PAGE]: () =>
        ++pages === 1
          ? respondError(500, 'internal', 'Something went wrong on the server.')
          : respond(200, page([admin, rider])),
    });
    renderApp('/admin/users');
    expect(await screen.findByText('Something went wrong on the server.')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('rider@demo.test')).toBeOnTheScreen();
  });

  it('creates a staff account with the shared rules and shows it in the list', async () => {
    const newcomer = accountUser('desk', { id: 9, name: 'Ivo Marsh', email: 'ivo@shop.test' });
    let pages = 0;
    serve({
      [FIRST_PAGE]: () => respond(200, page(++pages === 1 ? [admin, rider] : [admin, newcomer, rider])),
      'POST /api/users': respond(201, { user: newcomer }),
    });
    await openUsers();
    fireEvent.press(screen.getByRole('button', { name: 'Create a staff account' }));
    fireEvent.press(screen.getByRole('button', { name: 'Create the account' }));
    expect(await screen.findByText('Enter a name.')).toBeOnTheScreen();

    fireEvent.changeText(screen.getByLabelText('Name'), 'Ivo Marsh');
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'ivo@shop.test');
    fireEvent.changeText(screen.getByLabelText('First password'), 'workshop bench vice');
    fireEvent.press(screen.getByRole('button', { name: 'Create the account' }));

    expect(await screen.findByText(/Created Ivo Marsh's account \(Service desk, ivo@shop\.test\)/)).toBeOnTheScreen();
    expect(await screen.findByTestId('user-row-9')).toBeOnTheScreen();
    const post = fetchMock.mock.calls.find(([url]) => url === '/api/users')!;
    expect(JSON.parse(post[1].body as string)).toEqual({
      name: 'Ivo Marsh',
      email: 'ivo@shop.test',
      role: 'desk',
      password: 'workshop bench vice',
    });
  });
});
