/**
 * The rules table shared by the desk's and the admin's screens: grouped and numbered in the order
 * the loop tries the rows, each row's direction in words that agree with the row; the desk adds a
 * row, the admin also edits one and switches one off; the server's field messages land under their
 * fields. Rows from the common-practice seed and invented shop rows (./fixtures.ts); the server's
 * messages are those of server/services/damping-rules.service.ts.
 */
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react-native';

import { DampingRules } from '@/components/damping-rules/damping-rules';
import { directionWords, groupRules } from '@/components/damping-rules/rule-groups';
import type { DampingRuleView } from '@shared/types/test-ride';

import { answerBy, installFakeFetch, requestsOf, respond, respondError, type Answers } from '../../helpers/fake-fetch';
import { TestSWR } from '../../helpers/swr';
import { KINDS, ruleView, SEEDED, SHOP_ROWS, serverOrder } from './fixtures';

jest.mock('@/theme/use-layout', () => ({
  useLayout: () => ({ width: 390, isWide: false }),
}));

const { fetchMock } = installFakeFetch();

const RULES = serverOrder([...SEEDED, ...SHOP_ROWS]);

function serve(answers: Answers = {}) {
  fetchMock.mockImplementation(
    answerBy({
      'GET /api/damping-rules': respond(200, { rules: RULES }),
      'GET /api/damper-kinds': respond(200, { kinds: KINDS }),
      ...answers,
    }),
  );
}

function renderRules(canEdit: boolean) {
  render(
    <TestSWR>
      <DampingRules canEdit={canEdit} />
    </TestSWR>,
  );
}

/** The body of the last request made as `METHOD /api/path`. */
function sentBody(request: string): unknown {
  const call = [...fetchMock.mock.calls].reverse().find(([url, init]) => `${init.method ?? 'GET'} ${url}` === request);
  return call ? JSON.parse(String(call[1].body)) : undefined;
}

describe('DampingRules', () => {
  it('lists the groups in the rider’s order of symptoms and each group’s rows in the order tried', async () => {
    serve();
    renderRules(false);
    await screen.findByTestId('rule-groups');
    const groupIds = screen.getAllByTestId(/^rule-group-/).map((group) => group.props.testID);
    expect(groupIds).toEqual(groupRules(RULES).map((group) => `rule-group-${group.symptom}-${group.end}`));
    expect(groupIds[0]).toBe('rule-group-dives-braking-front');

    const bounce = within(screen.getByTestId('rule-group-bounces-after-bump-front'));
    expect(bounce.getAllByTestId(/^rule-\d+$/).map((row) => row.props.testID)).toEqual(['rule-3', 'rule-101', 'rule-4', 'rule-102']);
    expect(bounce.getByTestId('rule-3-state')).toHaveTextContent('Active, tried 1st');
    expect(bounce.getByTestId('rule-101-state')).toHaveTextContent('Active, tried 2nd');
    expect(bounce.getByTestId('rule-4-state')).toHaveTextContent('Active, tried 3rd');
    expect(bounce.getByTestId('rule-102-state')).toHaveTextContent('Switched off, not tried');
    expect(bounce.getByTestId('rule-3-source')).toHaveTextContent('common practice');
    expect(bounce.getByTestId('rule-101-source')).toHaveTextContent('added by the shop');
    expect(bounce.getByTestId('rule-101-adjuster')).toHaveTextContent('High-speed rebound');
    expect(bounce.getByTestId('rule-101-why')).toHaveTextContent(SHOP_ROWS[0].why);
    expect(bounce.getByTestId('rule-101-feel-for')).toHaveTextContent(SHOP_ROWS[0].feelFor);
  });

  it('words every row’s direction as the row has it: more is turning in, less is turning out', async () => {
    serve();
    renderRules(false);
    await screen.findByTestId('rule-groups');
    for (const rule of RULES) {
      const words = screen.getByTestId(`rule-${rule.id}-direction`);
      expect(words).toHaveTextContent(rule.direction === 'more' ? 'more damping (turn in)' : 'less damping (turn out)');
      expect(words).toHaveTextContent(directionWords(rule.direction));
    }
    // Braking dive takes more compression damping; harsh small bumps less (the seed, common practice).
    expect(screen.getByTestId('rule-1-direction')).toHaveTextContent('more damping (turn in)');
    const harsh = RULES.find((rule) => rule.symptom === 'harsh-small-bumps')!;
    expect(screen.getByTestId(`rule-${harsh.id}-direction`)).toHaveTextContent('less damping (turn out)');
  });

  it('lets the desk read and add, but offers no edit', async () => {
    const added = ruleView({ ...SHOP_ROWS[0], id: 103, symptom: 'squats-throttle', end: 'rear', adjuster: 'compression', priority: 3 });
    serve({ 'POST /api/damping-rules': respond(201, { rule: added }) });
    renderRules(false);
    await screen.findByTestId('rule-groups');
    expect(screen.queryByRole('button', { name: /^Edit rule/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /^Switch off rule/ })).toBeNull();

    fireEvent.press(screen.getByRole('button', { name: 'Add a rule' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Squats under power' }));
    // "Squats under power" is the shock's alone: the fork is not offered.
    expect(screen.queryByRole('radio', { name: 'Front (fork)' })).toBeNull();
    fireEvent.press(screen.getByRole('radio', { name: 'Rear (shock)' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Compression' }));
    fireEvent.press(screen.getByRole('radio', { name: 'More damping (turn in)' }));
    fireEvent.changeText(screen.getByLabelText('Priority'), '3');
    fireEvent.changeText(screen.getByLabelText('Why this change helps'), '  Heavier riders on our demo shock squat less with it.  ');
    fireEvent.changeText(screen.getByLabelText('What to feel for on the next ride'), 'The rear stays up out of corners.');
    fireEvent.press(screen.getByRole('button', { name: 'Add the rule' }));
    expect(await screen.findByTestId('rule-added')).toHaveTextContent('Added to “Squats under power”, rear (shock): Compression, more damping (turn in).');
    expect(sentBody('POST /api/damping-rules')).toEqual({
      symptom: 'squats-throttle',
      end: 'rear',
      adjuster: 'compression',
      direction: 'more',
      priority: 3,
      why: 'Heavier riders on our demo shock squat less with it.',
      feelFor: 'The rear stays up out of corners.',
      claim: null,
    });
    // The list is read again, so the new row takes its place in its group.
    await waitFor(() => expect(requestsOf(fetchMock).filter((request) => request === 'GET /api/damping-rules')).toHaveLength(2));
  });

  it('puts the server’s message for a second active row with the same move under the adjuster', async () => {
    const message = 'Rule 3 already turns the front rebound in (more damping) for this symptom: edit that one, or switch it off first.';
    serve({ 'POST /api/damping-rules': respondError(409, 'rule-exists', message, { adjuster: message }) });
    renderRules(false);
    fireEvent.press(await screen.findByRole('button', { name: 'Add a rule' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Keeps bouncing after a bump' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Front (fork)' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Rebound' }));
    fireEvent.press(screen.getByRole('radio', { name: 'More damping (turn in)' }));
    fireEvent.changeText(screen.getByLabelText('Priority'), '5');
    fireEvent.changeText(screen.getByLabelText('Why this change helps'), 'Again.');
    fireEvent.changeText(screen.getByLabelText('What to feel for on the next ride'), 'Again.');
    fireEvent.press(screen.getByRole('button', { name: 'Add the rule' }));
    expect(await screen.findByText(message)).toBeOnTheScreen();
    expect(screen.queryByTestId('form-error')).toBeNull();
  });

  it('lets the admin edit a row’s direction, priority and texts, and switch a row off', async () => {
    const edited: DampingRuleView = { ...SHOP_ROWS[0], direction: 'less', priority: 7 };
    const switchedOff: DampingRuleView = { ...SEEDED[2], active: false };
    serve({
      'PATCH /api/damping-rules/101': (init) => respond(200, { rule: JSON.parse(String(init.body)).active === undefined ? edited : SHOP_ROWS[0] }),
      'PATCH /api/damping-rules/3': respond(200, { rule: switchedOff }),
    });
    renderRules(true);
    fireEvent.press(await screen.findByRole('button', { name: 'Edit rule 101' }));
    const row = within(screen.getByTestId('rule-101'));
    expect(row.getByLabelText('Priority')).toHaveDisplayValue('1');
    fireEvent.press(row.getByRole('radio', { name: 'Less damping (turn out)' }));
    fireEvent.changeText(row.getByLabelText('Priority'), '7');
    fireEvent.press(row.getByRole('button', { name: 'Save the rule' }));
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Save the rule' })).toBeNull());
    expect(sentBody('PATCH /api/damping-rules/101')).toEqual({
      adjuster: 'hs-rebound',
      direction: 'less',
      priority: 7,
      why: SHOP_ROWS[0].why,
      feelFor: SHOP_ROWS[0].feelFor,
    });

    fireEvent.press(screen.getByRole('button', { name: 'Switch off rule 3' }));
    await waitFor(() => expect(sentBody('PATCH /api/damping-rules/3')).toEqual({ active: false }));
  });
});
