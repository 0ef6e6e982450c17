"use client";

import { useState } from "react";
import { NumberField } from "../combinations/number-field";
import { SelectField } from "../combinations/select-field";
import { limitChoice, limitOptions } from "./limit-ratios";
import { DEFAULT_LIMIT_RATIO } from "./read-deflection-inputs";

export type LimitRatioFieldProps = {
  /** Undefined: blank, which the calc reads as L/360. */
  ratio: number | undefined;
  onChange: (ratio: number | undefined) => void;
  readOnly: boolean;
  error?: string;
};

/** The limit as span / ratio: a preset, or a ratio of the author's own. */
export function LimitRatioField({ ratio, onChange, readOnly, error }: LimitRatioFieldProps) {
  const effective = ratio ?? DEFAULT_LIMIT_RATIO;
  // "Custom" stays chosen while the author types a ratio that passes through a preset on the way (3 → 36 → 360).
  const [custom, setCustom] = useState(() => limitChoice(effective) === "custom");
  const choice = custom ? "custom" : limitChoice(effective);
  return (
    <div className="flex items-start gap-2">
      <SelectField
        className="min-w-28"
        label="Limit"
        value={choice}
        options={limitOptions}
        onChange={(v) => {
          setCustom(v === "custom");
          if (v !== "custom") onChange(Number(v));
        }}
        readOnly={readOnly}
        error={choice === "custom" ? undefined : error}
      />
      {choice === "custom" && (
        <NumberField className="w-24" label="L /" name="span ratio: the span divided by" value={ratio} onChange={onChange} readOnly={readOnly} error={error} blankMeans={String(DEFAULT_LIMIT_RATIO)} />
      )}
    </div>
  );
}
