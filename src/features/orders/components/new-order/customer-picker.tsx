import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { WEARER_KINDS, WEARER_KIND_LABELS } from '@shared/schemas/orders.ts';
import type { CustomerView, WearerView } from '@shared/schemas/order-views.ts';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import type { NewOrderValues } from './new-order-values.ts';

/** Who the order is for: an existing customer and wearer, or new ones typed here. */
export function CustomerPicker({
  register,
  errors,
  customers,
  customerId,
  wearers,
  wearerId,
}: {
  register: UseFormRegister<NewOrderValues>;
  errors: FieldErrors<NewOrderValues>;
  customers: CustomerView[];
  customerId: string;
  wearers: WearerView[];
  wearerId: string;
}) {
  const isNew = customerId === 'new';
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <SelectField label="Customer" {...register('customerId')} error={errors.customerId?.message}>
        <option value="">Choose a customer…</option>
        <option value="new">New customer…</option>
        {customers.map((c) => (
          <option key={c.id} value={c.id}>
            {c.name}
            {c.email ? ` (${c.email})` : ''}
          </option>
        ))}
      </SelectField>
      {isNew ? (
        <>
          <TextField label="Customer name" autoComplete="off" {...register('newCustomer.name')} error={errors.newCustomer?.name?.message} wrapperClassName="sm:col-start-1" />
          <TextField label="Customer e-mail" type="email" autoComplete="off" hint="For the measuring link and the proof." {...register('newCustomer.email')} error={errors.newCustomer?.email?.message} />
          <TextField label="Customer phone" type="tel" autoComplete="off" {...register('newCustomer.phone')} error={errors.newCustomer?.phone?.message} />
        </>
      ) : (
        customerId && (
          <SelectField label="Wearer" {...register('wearerId')} error={errors.wearerId?.message}>
            <option value="">Choose who wears it…</option>
            <option value="new">New wearer…</option>
            {wearers.map((w) => (
              <option key={w.id} value={w.id}>
                {w.name} ({WEARER_KIND_LABELS[w.kind]})
              </option>
            ))}
          </SelectField>
        )
      )}
      {(isNew || wearerId === 'new') && (
        <>
          <TextField label="Wearer name" autoComplete="off" hint="The dog, the person… who wears the piece." {...register('newWearer.name')} error={errors.newWearer?.name?.message} wrapperClassName="sm:col-start-1" />
          <SelectField label="Wearer is a" {...register('newWearer.kind')} error={errors.newWearer?.kind?.message}>
            {WEARER_KINDS.map((k) => (
              <option key={k} value={k}>
                {WEARER_KIND_LABELS[k]}
              </option>
            ))}
          </SelectField>
        </>
      )}
    </div>
  );
}
