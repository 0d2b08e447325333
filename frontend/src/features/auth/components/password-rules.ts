import { PASSWORD_RULE, passwordMeetsRule } from '@causeway/shared';
import type { FormRule } from 'antd';

export const PASSWORD_HINT = `Use ${PASSWORD_RULE}.`;

export const newPasswordRules: FormRule[] = [
  { required: true, message: 'Choose a password' },
  {
    validator: (_rule, value: string | undefined) =>
      !value || passwordMeetsRule(value) ? Promise.resolve() : Promise.reject(new Error(`The password must have ${PASSWORD_RULE}`)),
  },
];

/** "Repeat the password" must match the field named `field`. */
export function repeatPasswordRules(field: string): FormRule[] {
  return [
    { required: true, message: 'Repeat the password' },
    ({ getFieldValue }) => ({
      validator: (_rule, value: string | undefined) =>
        !value || getFieldValue(field) === value ? Promise.resolve() : Promise.reject(new Error('The two passwords differ')),
    }),
  ];
}
