import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { CalcResultView } from "@/components/calculators/calc-result-view";
import { SafetyCautions } from "@/components/diagnosis/safety-cautions";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { Notice } from "@/components/ui/notice";
import { NumberField } from "@/components/ui/number-field";
import { fontSize, space } from "@/constants/theme";
import { useSaveCalculation, type CalcTarget } from "@/hooks/use-calculations";
import { useAlloys } from "@/hooks/use-melts";
import { useUnits } from "@/hooks/use-units";
import { ApiError } from "@/lib/api";
import {
  CALCULATOR_FIELDS,
  CALCULATOR_TITLES,
  calcFromField,
  calcTakesFractions,
  calcToField,
  calcUnit,
} from "@/lib/calculator-fields";
import { calculatorInputSchemas } from "@/lib/calculator-schemas";
import { fieldErrors } from "@/lib/field-errors";
import { CalcInputError, needsAlloy, runCalculator, type CalcResult, type CalculatorKind } from "@/rules/calculators";

type Props = { kind: CalculatorKind; prefill: Record<string, string>; target: CalcTarget; targetLabel?: string };

/** One calculator: its fields (prefilled from the melt or casting it was opened from), result and save. */
export function CalculatorForm({ kind, prefill, target, targetLabel }: Props) {
  const units = useUnits();
  const alloys = useAlloys();
  const fields = CALCULATOR_FIELDS[kind];
  // Prefills arrive in SI (the melt's values); the boxes show them in the person's units.
  const [text, setText] = useState<Record<string, string>>(() =>
    Object.fromEntries(
      fields.map((f) => [
        f.key,
        f.type === "number" ? calcToField(f.quantity, num(prefill[f.key]), units) : (prefill[f.key] ?? ""),
      ]),
    ),
  );
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [result, setResult] = useState<{ r: CalcResult; input: Record<string, unknown> }>();
  const save = useSaveCalculation();
  const shown = fields.filter((f) => !("showIf" in f) || !f.showIf || f.showIf[1].includes(text[f.showIf[0]]));

  function workOut() {
    const raw: Record<string, unknown> = {};
    for (const f of shown) {
      const v = f.type === "number" ? calcFromField(f.quantity, text[f.key], units) : text[f.key] || undefined;
      if (v !== undefined) raw[f.key] = v;
    }
    const parsed = calculatorInputSchemas[kind].safeParse(raw);
    if (!parsed.success) {
      setErrors(fieldErrors(parsed.error, { topLevel: true, units }));
      setResult(undefined);
      return;
    }
    const alloy = alloys.data?.find((a) => a.designation === raw.alloy);
    if (needsAlloy(kind) && !alloy) return setErrors({ alloy: "choose an alloy" });
    try {
      setResult({ r: runCalculator(kind, parsed.data as never, alloy), input: parsed.data });
      setErrors({});
      save.reset();
    } catch (e) {
      if (!(e instanceof CalcInputError)) throw e;
      setErrors({ [e.field]: e.message });
      setResult(undefined);
    }
  }

  const saveError = save.error as ApiError | null;
  return (
    <View style={styles.wrap}>
      {CALCULATOR_TITLES[kind].pour ? <SafetyCautions /> : null}
      {shown.map((f) =>
        f.type === "number" ? (
          <NumberField
            key={f.key}
            label={f.label}
            unit={calcUnit(f.quantity, units)}
            fractions={calcTakesFractions(f.quantity, units)}
            // Only the air can be below zero.
            signed={f.key === "airTempC"}
            value={text[f.key]}
            onChangeText={(t) => setText({ ...text, [f.key]: t })}
            error={errors[f.key]}
          />
        ) : (
          <View key={f.key}>
            <ChoiceChips
              label={f.label}
              options={
                f.type === "alloy"
                  ? (alloys.data ?? []).map((a) => ({ value: a.designation, label: a.designation }))
                  : f.options
              }
              value={text[f.key] || null}
              onChange={(v) => setText({ ...text, [f.key]: v })}
            />
            {errors[f.key] ? (
              <Text role="alert" style={styles.error}>
                {errors[f.key]}
              </Text>
            ) : null}
          </View>
        ),
      )}
      <Button label="Work it out" onPress={workOut} />
      {result ? <CalcResultView result={result.r} units={units} /> : null}
      {result && (target.meltId || target.castingId) ? (
        save.isSuccess ? (
          <Notice>Saved on {targetLabel ?? "the melt"}.</Notice>
        ) : (
          <Button
            kind="plain"
            label={`Save on ${targetLabel ?? "the melt"}`}
            busy={save.isPending}
            onPress={() => save.mutate({ ...target, kind, input: result.input })}
          />
        )
      ) : null}
      {saveError ? (
        <Notice tone="error">
          {[saveError.message, ...Object.values(saveError instanceof ApiError ? saveError.fieldsIn(units) : {})].join(
            " ",
          )}
        </Notice>
      ) : null}
    </View>
  );
}

const num = (s: string | undefined) => (s === undefined || s === "" ? undefined : Number(s));

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  error: { color: "#B42318", fontSize: fontSize.detail },
});
