// The household's unit system for every screen: components write quantities through these, never on their own.
import { createContext, useContext, useMemo, type ReactNode } from 'react';
import type { IngredientUnit, JarSize, UnitSystem } from '@shared/domain/units';
import {
  altitudeWords,
  amountWords,
  headspaceWords,
  jarSizeWords,
  pressureWords,
  tbspPerDay,
  tbspWords,
} from '@shared/words';

const UnitSystemContext = createContext<UnitSystem>('us');

export function UnitSystemProvider({ system, children }: { system: UnitSystem; children: ReactNode }) {
  return <UnitSystemContext.Provider value={system}>{children}</UnitSystemContext.Provider>;
}

/** The shared formatters, bound to the household's unit system. */
export function useUnits() {
  const system = useContext(UnitSystemContext);
  return useMemo(
    () => ({
      system,
      amount: (value: number, unit: IngredientUnit) => amountWords(value, unit, system),
      altitude: (feet: number) => altitudeWords(feet, system),
      pressure: (psi: number, short = false) => pressureWords(psi, short, system),
      headspace: (inches: number) => headspaceWords(inches, system),
      jarSize: (size: JarSize) => jarSizeWords(size, system),
      tbsp: (tbsp: number) => tbspWords(tbsp, system),
      tbspPerDay: (rate: number) => tbspPerDay(rate, system),
    }),
    [system],
  );
}
export type Units = ReturnType<typeof useUnits>;
