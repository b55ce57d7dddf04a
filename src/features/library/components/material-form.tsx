import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { MATERIAL_SCHEMAS, type MaterialKind } from '@shared/schemas/materials';
import type { MaterialViews } from '@shared/views/materials';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextArea, TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { placeServerError } from '@/lib/form-errors';
import { useCreateMaterial } from '../api/create-material';
import { useReplaceMaterial } from '../api/replace-material';
import { KIND_SPECS, type MaterialField } from './material-fields';

type Values = Record<string, unknown>;

/**
 * An empty box means "not given": null for an optional number (so PUT clears it) and
 * undefined for a required one (so the schema names the missing field).
 */
function numberFrom(field: MaterialField) {
  return (raw: unknown) => (raw === '' || raw === null || raw === undefined ? (field.required ? undefined : null) : Number(raw));
}

function startingValues(fields: MaterialField[], entry: Values | null): Values {
  return Object.fromEntries(
    fields.map((field) => {
      const current = entry?.[field.name];
      if (current !== undefined && current !== null) return [field.name, current];
      if (field.type === 'select') return [field.name, field.options![0].value];
      if (field.type === 'number') return [field.name, field.required ? undefined : null];
      return [field.name, ''];
    }),
  );
}

/** Adds an entry or replaces one (PUT sends every field, so the stored entry is exactly the form). */
export function MaterialForm<K extends MaterialKind>({ kind, entry, onSaved, onCancel }: { kind: K; entry: MaterialViews[K] | null; onSaved: (item: MaterialViews[K]) => void; onCancel: () => void }) {
  const spec = KIND_SPECS[kind];
  const create = useCreateMaterial(kind);
  const replace = useReplaceMaterial(kind);
  const [problem, setProblem] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(MATERIAL_SCHEMAS[kind] as never) as unknown as Resolver<Values>,
    defaultValues: startingValues(spec.fields, entry as unknown as Values | null),
  });
  const submit = handleSubmit(async (values) => {
    setProblem(null);
    try {
      const { item } = entry ? await replace.mutateAsync({ id: entry.id, input: values }) : await create.mutateAsync(values);
      onSaved(item as MaterialViews[K]);
    } catch (error) {
      setProblem(placeServerError(error, setError, spec.fields.map((f) => f.name)));
    }
  });
  const title = entry ? `Edit ${entry.name}` : `Add a ${spec.singular}`;
  return (
    <form onSubmit={submit} noValidate aria-label={title} className="grid gap-4 md:grid-cols-3">
      {problem && (
        <Notice tone="error" className="md:col-span-3">
          {problem}
        </Notice>
      )}
      {spec.fields.map((field) => (
        <Field key={field.name} label={field.label} hint={field.hint && <span className="text-ink-soft">{field.hint}</span>} error={formState.errors[field.name]?.message as string | undefined} className={field.wide ? 'md:col-span-3' : ''}>
          {(props) =>
            field.type === 'textarea' ? (
              <TextArea {...props} {...register(field.name)} />
            ) : field.type === 'select' ? (
              <SelectInput {...props} {...register(field.name, typeof field.options![0].value === 'number' ? { setValueAs: Number } : {})}>
                {field.options!.map((option) => (
                  <option key={option.value} value={option.value}>
                    {option.label}
                  </option>
                ))}
              </SelectInput>
            ) : field.type === 'number' ? (
              <TextInput {...props} type="number" step="any" inputMode="decimal" {...register(field.name, { setValueAs: numberFrom(field) })} />
            ) : (
              <TextInput {...props} {...register(field.name)} />
            )
          }
        </Field>
      ))}
      <div className="flex gap-2 md:col-span-3">
        <Button type="submit" busy={create.isPending || replace.isPending}>
          {entry ? 'Save changes' : `Add ${spec.singular}`}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
