import { render, screen, within } from '@testing-library/react-native';

import { ImportReport } from '@/components/catalogue/import-report';
import type { ImportDryRun } from '@shared/types/catalogue';

const report: ImportDryRun = {
  token: null,
  fileName: 'springs.csv',
  contentSha256: 'abc',
  columns: ['sku', 'kind', 'family', 'rate_n_mm', 'on_hand'],
  ignoredColumns: ['colour'],
  counts: { rows: 4, new: 1, updated: 1, unchanged: 1, errors: 1, stockCorrections: 1 },
  rows: [
    { line: 2, sku: 'KF37-0090', outcome: 'new' },
    { line: 3, sku: 'KF37-0095', outcome: 'updated', changes: ['priceCents'], stock: { from: 2, to: 5 } },
    { line: 4, sku: 'KF37-0100', outcome: 'unchanged' },
    { line: 5, sku: 'KF37-0105', outcome: 'error', errors: [{ column: 'rate_n_mm', message: 'Rate must be a number.' }] },
  ],
};

describe('ImportReport', () => {
  it('shows the counts and the ignored columns', () => {
    render(<ImportReport report={report} />);
    expect(screen.getByTestId('import-counts')).toHaveTextContent(
      '4 rows: 1 new, 1 updated, 1 unchanged, 1 with errors; 1 count correction.',
    );
    expect(screen.getByText(/not recognised.*colour/)).toBeOnTheScreen();
  });

  it.each([
    [2, 'New', []],
    [3, 'Updated', ['Changes priceCents.', 'Count correction: on hand 2 → 5.']],
    [4, 'Unchanged', []],
    [5, 'Error', ['rate_n_mm: Rate must be a number.']],
  ])('shows line %i as %s with its details', (line, label, details) => {
    render(<ImportReport report={report} />);
    const row = within(screen.getByTestId(`import-row-${line}`));
    expect(row.getByText(new RegExp(`^Line ${line} · `))).toBeOnTheScreen();
    expect(row.getByText(label)).toBeOnTheScreen();
    details.forEach((detail) => expect(row.getByText(detail)).toBeOnTheScreen());
  });
});
