import { ChipField } from '@/components/form/chip-field';
import { TextField } from '@/components/form/text-field';
import type { DamperKind, DampingDirection } from '@shared/types/damping';
import { RULE_PRIORITY } from '@shared/schemas/damping.schema';

import { directionWords } from './rule-groups';

const DIRECTIONS: readonly DampingDirection[] = ['more', 'less'];

/** "More damping (turn in)": the row's words, capitalised for a choice of its own. */
const DIRECTION_OPTIONS = DIRECTIONS.map((direction) => {
  const words = directionWords(direction);
  return { value: direction, label: words.charAt(0).toUpperCase() + words.slice(1) };
});

/**
 * The fields a new row and an edited one share: the adjuster, which way, the priority and the two
 * sentences the rider reads. `current` keeps a row's adjuster choosable once its kind has left the
 * list the screen has (the server still knows it).
 */
export function RuleChangeFields({ kinds, current, idPrefix }: { kinds: readonly DamperKind[]; current?: string; idPrefix: string }) {
  const options = kinds.map((kind) => ({ value: kind.key, label: kind.label }));
  if (current && !options.some((option) => option.value === current)) options.push({ value: current, label: current });
  return (
    <>
      <ChipField name="adjuster" label="Adjuster to turn" options={options} />
      <ChipField name="direction" label="Which way" options={DIRECTION_OPTIONS} />
      <TextField
        name="priority"
        label="Priority"
        hint={`${RULE_PRIORITY.min} to ${RULE_PRIORITY.max}; the rows of a symptom and end are tried lowest first (the common-practice rows use 1 to 4).`}
        inputMode="numeric"
        testID={`${idPrefix}-priority`}
      />
      <TextField name="why" label="Why this change helps" multiline testID={`${idPrefix}-why`} />
      <TextField name="feelFor" label="What to feel for on the next ride" multiline testID={`${idPrefix}-feel-for`} />
    </>
  );
}
