import { useState } from "react";
import { useTranslation } from "react-i18next";
import type { Preferences, PreferencesResponse } from "#shared/schemas/preferences";
import { Notice } from "#shared/ui/index";
import { formatArea, formatHeight, setUnits, useUnits } from "../../../common/lib/units.ts";
import { applyLanguage } from "../../../i18n/index.ts";
import type { Language, Units } from "../../../i18n/language.ts";
import { useUpdatePreferences } from "../api/update-preferences.ts";
import { ChoiceGroup } from "./choice-group.tsx";

// Each language is named in itself, so someone who can't read the current one still finds theirs.
const languages = [
  { value: "en", label: "English", lang: "en" },
  { value: "es", label: "Español", lang: "es" },
] as const;

/**
 * Language and units change the screen at once (no Save button to miss) and are then saved
 * to the account when settings can be saved; otherwise they stay on this device.
 */
export function DisplayChoices({ saved }: { saved: PreferencesResponse | undefined }) {
  const { t, i18n } = useTranslation();
  const units = useUnits();
  const update = useUpdatePreferences();
  const applied: Language = i18n.language === "es" ? "es" : "en";
  // Spanish downloads on first use; the radio shows the choice at once rather than after that.
  const [chosenLanguage, setChosenLanguage] = useState<Language | null>(null);
  const language = chosenLanguage ?? applied;

  const [changedHere, setChangedHere] = useState(false);

  const saveToAccount = (change: Partial<Preferences>) => {
    setChangedHere(true);
    if (saved) update.mutate({ ...saved.preferences, ...change });
  };

  return (
    <div className="flex flex-col gap-5">
      <ChoiceGroup
        legend={t("settings.display.languageLegend")}
        choices={languages}
        value={language}
        onChoose={(next: Language) => {
          setChosenLanguage(next);
          void applyLanguage(next);
          saveToAccount({ language: next });
        }}
      />
      <ChoiceGroup
        legend={t("settings.display.unitsLegend")}
        hint={t("settings.display.unitsExample", { area: formatArea(5000, units, i18n.language), height: formatHeight(3.5, units) })}
        choices={(["us", "metric"] as const).map((value) => ({ value, label: t(`settings.display.units.${value}`) }))}
        value={units}
        onChoose={(next: Units) => {
          setUnits(next);
          saveToAccount({ units: next });
        }}
      />
      {changedHere && (update.isError || !saved) && <Notice tone="info">{t("settings.display.savedOnDeviceOnly")}</Notice>}
    </div>
  );
}
