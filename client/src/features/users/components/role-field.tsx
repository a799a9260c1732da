import { useTranslation } from 'react-i18next';
import { ROLES, type Role } from '@yardcall/shared';
import { ChoiceField } from '@/components/ui/choice-field';

// A person's role, picked from the roles there are.
export function RoleField({
  label,
  value,
  onChange,
  error,
  disabled,
}: {
  label: string;
  value: Role;
  onChange: (role: Role) => void;
  error?: string;
  disabled?: boolean;
}) {
  const { t } = useTranslation();
  return (
    <ChoiceField
      label={label}
      value={value}
      error={error}
      disabled={disabled}
      // No "any" choice: a role is always picked.
      onPick={(role) => role && onChange(role)}
      choices={ROLES.map((role) => ({ value: role, label: t(`roles.${role}`) }))}
    />
  );
}
