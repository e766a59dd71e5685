import { NumberField } from '../../ui';
import type { FieldSpec, NumberFields } from '../hooks/use-number-fields';
import { displayUnits } from './display-units';

/**
 * Builds a calculator's `field(key, label, placeholder)`: a number input bound to one of its fields,
 * labelled with the field's display unit, showing `error(key)`, with test id `${testID}-${key}`.
 */
export function fieldRenderer<K extends string>(fields: NumberFields<K>, spec: FieldSpec<K>, error: (k: K) => string | undefined, testID: string) {
  return function field(k: K, label: string, placeholder?: string) {
    return (
      <NumberField
        label={label}
        unit={displayUnits[spec[k].unit].symbol}
        value={fields.text[k]}
        onChangeText={(t) => fields.setText(k, t)}
        error={error(k)}
        placeholder={placeholder}
        testID={`${testID}-${k}`}
      />
    );
  };
}
