"use client";

import Link from "next/link";
import { useMemo, useState, type ReactNode } from "react";
import { useFieldArray, useWatch, type FieldErrors } from "react-hook-form";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { PartPicker, StandardPicker, type PickedPart, type PickedStandard } from "@/components/proposals/pickers";
import { PhotoDrop, type PhotoItem } from "@/components/proposals/photo-drop";
import { Button } from "@/components/ui/button";
import { Field, FieldError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";
import {
  CATEGORY_NAMES,
  FIT_NAMES,
  FITS,
  PART_CATEGORIES,
  STANDARD_KIND_NAMES,
  STANDARD_KINDS,
} from "@/lib/catalogue/kinds";
import { checkAgainstPart, checkStandard } from "@/lib/proposals/checks";
import { MEASURED_DIMENSIONS, MEASURED_NAMES, type ProposalCheck } from "@/lib/proposals/kinds";
import type { SubmitOutcome } from "@/lib/proposals/proposals";
import { proposalInput, type ProposalFormValues, type ProposalInput } from "@/lib/validation/proposals";

export interface FormChoices {
  makers: Array<{ id: number; name: string }>;
  machines: Array<{ id: number; makerId: number; model: string }>;
  assemblies: Array<{ id: number; name: string }>;
}

export interface ProposalFormProps {
  choices: FormChoices;
  defaults: ProposalFormValues;
  pickedPart: PickedPart | null;
  pickedStandard: PickedStandard | null;
  photos: PhotoItem[];
  /** Editing a proposal that was sent back: PATCH to it instead of POSTing a new one. */
  editId?: number;
}

const numberOrNull = (v: unknown) => (v === "" || v === null || v === undefined ? null : Number(v));

function Choice({
  name,
  value,
  checked,
  onChange,
  children,
  testId,
}: {
  name: string;
  value: string;
  checked: boolean;
  onChange: () => void;
  children: ReactNode;
  testId?: string;
}) {
  return (
    <label
      className={
        `flex cursor-pointer items-start gap-3 rounded-md border-2 p-3 ` +
        `${checked ? "border-brass bg-brass-wash" : "border-rule bg-ground-raised"}`
      }
      data-testid={testId}
    >
      <input
        type="radio"
        name={name}
        value={value}
        checked={checked}
        onChange={onChange}
        className="mt-1 h-5 w-5 accent-brass"
      />
      <span>{children}</span>
    </label>
  );
}

function Section({
  number,
  title,
  hint,
  children,
}: {
  number: number;
  title: string;
  hint?: string;
  children: ReactNode;
}) {
  return (
    <fieldset className="space-y-4 rounded-lg border border-rule bg-ground p-4 sm:p-5">
      <legend className="px-1 text-xl font-bold">
        <span className="mr-2 num text-brass">{number}</span>
        {title}
      </legend>
      {hint && <p className="-mt-2 text-ink-soft">{hint}</p>}
      {children}
    </fieldset>
  );
}

function Checks({ checks }: { checks: ProposalCheck[] }) {
  if (checks.length === 0) return null;
  return (
    <ul className="space-y-2" aria-label="What the standards engine found" data-testid="checks">
      {checks.map((c) => (
        <li key={c.message}>
          <Notice tone={c.level === "warning" ? "caution" : "success"}>{c.message}</Notice>
        </li>
      ))}
    </ul>
  );
}

type Outcome =
  | SubmitOutcome
  | {
      outcome: "submitted";
      proposal: { id: number; status: string };
      checks: ProposalCheck[];
      photosMissing: number[];
    };

function Result({ outcome, edited }: { outcome: Outcome; edited: boolean }) {
  if (outcome.outcome === "confirmed") {
    return (
      <Notice tone="success" role="status">
        <p className="font-bold">{outcome.message}</p>
        <p>
          <Link href={`/parts/${outcome.partId}`}>See the part page</Link>
        </p>
      </Notice>
    );
  }
  if (outcome.outcome === "confirmed_pending") {
    return (
      <Notice tone="success" role="status">
        <p className="font-bold">{outcome.message}</p>
        <p>
          <Link href="/proposals">See your proposals</Link>
        </p>
      </Notice>
    );
  }
  return (
    <div className="space-y-3" role="status">
      <Notice tone="success">
        <p className="font-bold">
          {edited
            ? "Your changes are sent. The proposal is back in the review queue."
            : "Thank you. Your proposal is in the review queue."}
        </p>
        <p>A moderator checks it before it reaches the catalogue; you get an e-mail when it is decided.</p>
      </Notice>
      {outcome.photosMissing.length > 0 && (
        <Notice tone="caution">
          {outcome.photosMissing.length === 1 ? "One photo" : `${outcome.photosMissing.length} photos`} did not reach
          storage, so the proposal was saved without {outcome.photosMissing.length === 1 ? "it" : "them"}. Your text is
          kept.
        </Notice>
      )}
      <Checks checks={outcome.checks} />
      <p className="flex flex-wrap gap-4">
        <Link href="/proposals">See your proposals</Link>
        <Link href="/propose">Propose another cross</Link>
      </p>
    </div>
  );
}

function errorAt(errors: FieldErrors<ProposalFormValues>, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split(".")) node = (node as Record<string, unknown> | undefined)?.[key];
  return (node as { message?: string } | undefined)?.message;
}

/** The proposal form; the same zod schema checks it here and in the route handler. */
export function ProposalForm({
  choices,
  defaults,
  pickedPart: initialPart,
  pickedStandard: initialStandard,
  photos,
  editId,
}: ProposalFormProps) {
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const { form, onSubmit, formError } = useApiForm<ProposalFormValues, ProposalInput, Outcome>({
    schema: proposalInput,
    endpoint: editId ? `/api/proposals/${editId}` : "/api/proposals",
    method: editId ? "PATCH" : "POST",
    defaultValues: defaults,
    onSuccess: (data) => {
      setOutcome(data);
      window.scrollTo({ top: 0 });
    },
  });
  const { register, control, setValue, formState } = form;
  const errors = formState.errors;
  const measurements = useFieldArray({ control, name: "measurements" });
  const [pickedPart, setPickedPart] = useState(initialPart);
  const [pickedStandard, setPickedStandard] = useState(initialStandard);
  const [photosBusy, setPhotosBusy] = useState(false);

  const originalMode = useWatch({ control, name: "original.mode" });
  const standardMode = useWatch({ control, name: "standard.mode" });
  const makerId = useWatch({ control, name: "original.makerId" });
  const machineId = useWatch({ control, name: "original.machineId" });
  const fit = useWatch({ control, name: "fit" });
  const standard = useWatch({ control, name: "standard" });

  const checked = useMemo(() => {
    if (standardMode !== "new" || !standard?.kind || !standard.designation || standard.designation.trim().length < 2)
      return null;
    const n = (v: unknown) => (typeof v === "number" && Number.isFinite(v) ? v : null);
    return checkStandard({
      kind: standard.kind,
      designation: standard.designation,
      innerMm: n(standard.innerMm),
      outerMm: n(standard.outerMm),
      widthMm: n(standard.widthMm),
      lengthMm: n(standard.lengthMm),
      template: standard.template,
    });
  }, [standardMode, standard]);
  const liveChecks = checked?.checks ?? [];
  // The same comparison the server makes and the review page shows first: the standard part against the worn part's
  // documented sizes.
  const sizeMismatch = useMemo(() => {
    if (originalMode !== "existing" || !pickedPart?.dims) return null;
    const proposed =
      standardMode === "new"
        ? checked
        : pickedStandard?.dims && pickedStandard.kind
          ? { ...pickedStandard.dims, kind: pickedStandard.kind, designation: pickedStandard.designation }
          : null;
    return proposed ? checkAgainstPart({ number: pickedPart.number, ...pickedPart.dims }, proposed) : null;
  }, [originalMode, pickedPart, standardMode, checked, pickedStandard]);

  const machines = choices.machines.filter((m) => m.makerId === Number(makerId));

  if (outcome) return <Result outcome={outcome} edited={Boolean(editId)} />;

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6">
      <Section number={1} title="The worn part" hint="The part you took off the machine.">
        <div className="grid gap-2 sm:grid-cols-2">
          <Choice
            name="original-mode"
            value="existing"
            checked={originalMode === "existing"}
            onChange={() => setValue("original.mode", "existing")}
          >
            It is in the catalogue
          </Choice>
          <Choice
            name="original-mode"
            value="new"
            checked={originalMode === "new"}
            onChange={() => setValue("original.mode", "new")}
          >
            It is not in the catalogue yet
          </Choice>
        </div>
        {originalMode === "existing" ? (
          <PartPicker
            picked={pickedPart}
            error={errorAt(errors, "original.partId")}
            onPick={(p) => {
              setPickedPart(p);
              setValue("original.partId", p?.id ?? null, { shouldValidate: Boolean(p) });
            }}
          />
        ) : (
          <div className="grid gap-4 sm:grid-cols-2">
            <SelectField
              id="maker"
              label="Maker"
              error={errorAt(errors, "original.makerId")}
              {...register("original.makerId", { setValueAs: numberOrNull })}
            >
              <option value="">Choose…</option>
              {choices.makers.map((m) => (
                <option key={m.id} value={m.id}>
                  {m.name}
                </option>
              ))}
            </SelectField>
            <Field
              id="number"
              label="Factory number"
              mono
              hint="As stamped or as in the parts book."
              error={errorAt(errors, "original.number")}
              {...register("original.number")}
            />
            <Field
              id="description"
              label="What it is"
              hint="For example: fan shaft bearing, front."
              error={errorAt(errors, "original.description")}
              {...register("original.description")}
            />
            <SelectField
              id="category"
              label="Kind of part"
              error={errorAt(errors, "original.category")}
              {...register("original.category", { setValueAs: (v) => v || null })}
            >
              <option value="">Choose…</option>
              {PART_CATEGORIES.map((c) => (
                <option key={c} value={c}>
                  {CATEGORY_NAMES[c]}
                </option>
              ))}
            </SelectField>
            <SelectField
              id="machine"
              label="Machine (if you know it)"
              error={errorAt(errors, "original.machineId")}
              {...register("original.machineId", { setValueAs: numberOrNull })}
            >
              <option value="">Not sure / several</option>
              {machines.map((m) => (
                <option key={m.id} value={m.id}>
                  {m.model}
                </option>
              ))}
            </SelectField>
            {Boolean(machineId) && (
              <SelectField
                id="assembly"
                label="Where on the machine"
                error={errorAt(errors, "original.assemblyId")}
                {...register("original.assemblyId", { setValueAs: numberOrNull })}
              >
                <option value="">Choose…</option>
                {choices.assemblies.map((a) => (
                  <option key={a.id} value={a.id}>
                    {a.name}
                  </option>
                ))}
              </SelectField>
            )}
          </div>
        )}
      </Section>

      <Section
        number={2}
        title="The standard part you fitted"
        hint="The part you can buy today by its standard number."
      >
        <div className="grid gap-2 sm:grid-cols-2">
          <Choice
            name="standard-mode"
            value="existing"
            checked={standardMode === "existing"}
            onChange={() => setValue("standard.mode", "existing")}
          >
            Pick it from the catalogue
          </Choice>
          <Choice
            name="standard-mode"
            value="new"
            checked={standardMode === "new"}
            onChange={() => setValue("standard.mode", "new")}
          >
            Enter it by designation and sizes
          </Choice>
        </div>
        {standardMode === "existing" ? (
          <StandardPicker
            picked={pickedStandard}
            error={errorAt(errors, "standard.standardPartId")}
            onPick={(p) => {
              setPickedStandard(p);
              setValue("standard.standardPartId", p?.id ?? null, { shouldValidate: Boolean(p) });
            }}
          />
        ) : (
          <div className="space-y-4">
            <div className="grid gap-4 sm:grid-cols-2">
              <SelectField
                id="standard-kind"
                label="Kind"
                error={errorAt(errors, "standard.kind")}
                {...register("standard.kind", { setValueAs: (v) => v || null })}
              >
                <option value="">Choose…</option>
                {STANDARD_KINDS.map((k) => (
                  <option key={k} value={k}>
                    {STANDARD_KIND_NAMES[k]}
                  </option>
                ))}
              </SelectField>
              <Field
                id="designation"
                label="Designation"
                mono
                hint="6205-2RS, 35 × 52 × 7, B43…"
                error={errorAt(errors, "standard.designation")}
                {...register("standard.designation")}
              />
            </div>
            <div className="grid grid-cols-2 gap-4 sm:grid-cols-4">
              {(
                [
                  ["innerMm", "Bore / shaft"],
                  ["outerMm", "Outside"],
                  ["widthMm", "Width"],
                  ["lengthMm", "Length"],
                ] as const
              ).map(([key, label]) => (
                <Field
                  key={key}
                  id={`standard-${key}`}
                  label={label}
                  mono
                  inputMode="decimal"
                  suffix="mm"
                  error={errorAt(errors, `standard.${key}`)}
                  {...register(`standard.${key}`, { setValueAs: numberOrNull })}
                />
              ))}
            </div>
            {standard?.kind === "gasket" && (
              <Field
                id="standard-template"
                label="Template"
                mono
                hint="The link from Measure → Gasket: the gasket is kept as the template it is cut to."
                error={errorAt(errors, "standard.template")}
                {...register("standard.template", { setValueAs: (v) => v || null })}
              />
            )}
            <p className="text-sm text-ink-soft">
              Sizes are optional when the designation says them; the engine checks any you enter against it.
            </p>
            <Checks checks={liveChecks} />
          </div>
        )}
        {sizeMismatch && (
          <div data-testid="size-mismatch">
            <Notice tone="caution" role="alert">
              {sizeMismatch.message}
            </Notice>
          </div>
        )}
      </Section>

      <Section number={3} title="How it fitted">
        <div className="grid gap-2">
          {FITS.map((f) => (
            <Choice
              key={f}
              name="fit"
              value={f}
              checked={fit === f}
              onChange={() => setValue("fit", f, { shouldValidate: true })}
              testId={`fit-${f}`}
            >
              <span className="font-bold">
                {FIT_NAMES[f].mark} {FIT_NAMES[f].word}
              </span>
              <span className="block text-sm text-ink-soft">{FIT_NAMES[f].text}</span>
            </Choice>
          ))}
        </div>
        {errorAt(errors, "fit") && <FieldError id="fit-error">{errorAt(errors, "fit")}</FieldError>}
      </Section>

      <Section
        number={4}
        title="What you measured on the old part"
        hint={
          "With calipers or a micrometer; inch or mm. Worn sizes are fine: the " +
          "reviewer compares them with the standard part."
        }
      >
        {measurements.fields.length === 0 && <p className="text-ink-soft">No measurements yet.</p>}
        <ol className="space-y-3">
          {measurements.fields.map((row, i) => (
            <li
              key={row.id}
              className="grid items-end gap-3 rounded-md border border-rule p-3 sm:grid-cols-[1fr_1fr_7rem_auto]"
            >
              <SelectField
                id={`m-${i}-dimension`}
                label="Which size"
                error={errorAt(errors, `measurements.${i}.dimension`)}
                {...register(`measurements.${i}.dimension`)}
              >
                {MEASURED_DIMENSIONS.map((d) => (
                  <option key={d} value={d}>
                    {MEASURED_NAMES[d]}
                  </option>
                ))}
              </SelectField>
              <Field
                id={`m-${i}-value`}
                label="Measured"
                mono
                inputMode="decimal"
                error={errorAt(errors, `measurements.${i}.value`)}
                {...register(`measurements.${i}.value`, { setValueAs: numberOrNull })}
              />
              <SelectField id={`m-${i}-unit`} label="Unit" {...register(`measurements.${i}.unit`)}>
                <option value="mm">mm</option>
                <option value="in">in</option>
              </SelectField>
              <Button type="button" variant="secondary" onClick={() => measurements.remove(i)}>
                Remove
              </Button>
            </li>
          ))}
        </ol>
        {measurements.fields.length < 12 && (
          <Button
            type="button"
            variant="secondary"
            onClick={() =>
              measurements.append({ dimension: "inner", value: undefined as unknown as number, unit: "mm" })
            }
          >
            Add a measurement
          </Button>
        )}
      </Section>

      <Section number={5} title="Notes on the fit">
        <div className="space-y-1">
          <label htmlFor="notes" className="block font-bold">
            What should the next person know?
          </label>
          <p id="notes-hint" className="text-sm text-ink-soft">
            Any machining, spacers or sleeves; which way a lip faces; how long it has run. Plain text only.
          </p>
          <textarea
            id="notes"
            rows={5}
            aria-describedby={errorAt(errors, "notes") ? "notes-hint notes-error" : "notes-hint"}
            aria-invalid={errorAt(errors, "notes") ? true : undefined}
            className={
              "block w-full rounded-md border-2 border-rule-strong bg-ground-raised " +
              "px-3 py-2 text-lg focus:border-brass"
            }
            {...register("notes")}
          />
          {errorAt(errors, "notes") && <FieldError id="notes-error">{errorAt(errors, "notes")}</FieldError>}
        </div>
      </Section>

      <Section number={6} title="Photos">
        <PhotoDrop
          initial={photos}
          onChange={(ids, busy) => {
            setValue("photoIds", ids);
            setPhotosBusy(busy);
          }}
        />
      </Section>

      {formError && (
        <Notice tone="caution" role="alert">
          {formError}
        </Notice>
      )}
      {Object.keys(errors).length > 0 && !formError && (
        <Notice tone="caution" role="alert">
          Some answers need another look; they are marked above.
        </Notice>
      )}
      <div className="flex flex-wrap items-center gap-4">
        <Button type="submit" pending={formState.isSubmitting} disabled={photosBusy}>
          {editId ? "Send the changes" : "Send for review"}
        </Button>
        {photosBusy && <p className="text-ink-soft">Waiting for photos to finish uploading…</p>}
      </div>
    </form>
  );
}
