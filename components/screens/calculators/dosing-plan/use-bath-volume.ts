import { useLocalSearchParams } from 'expo-router';
import { useEffect, useState } from 'react';

import { useBath } from '@/lib/api/use-baths';

/** Volume units a tank is given in. */
export type TankUnit = 'L' | 'gal';

/** The volume units offered, for a ChoiceChips group. */
export const TANK_UNITS = [
  { value: 'L', label: 'L', hint: 'Litres' },
  { value: 'gal', label: 'gal', hint: 'US gallons' },
] as const;

/** A tank volume as typed, and its unit. */
export type TankVolume = { text: string; unit: TankUnit };

/** The tank volume field's state and setters; `fromBath` names the bath it was filled from. */
export type VolumeField = TankVolume & { setText: (text: string) => void; setUnit: (unit: TankUnit) => void; fromBath: string | null };

/**
 * The tank volume field of a calculator, filled once from the bath in the route (`?bath=<id>`) when
 * it arrives and the person has not typed one; empty (asked for) without a bath.
 */
export function useTankVolume(): VolumeField {
  const { bath: id } = useLocalSearchParams<{ bath?: string }>();
  const bath = useBath(typeof id === 'string' && id.trim() !== '' ? id : null).data;
  const [volume, setVolume] = useState<TankVolume>({ text: '', unit: 'L' });
  const [filledFrom, setFilledFrom] = useState<string | null>(null);
  useEffect(() => {
    if (!bath || filledFrom === bath.id || !Number.isFinite(bath.volume)) return;
    setFilledFrom(bath.id);
    setVolume((now) => (now.text.trim() === '' ? { text: String(bath.volume), unit: bath.volumeUnit } : now));
  }, [bath, filledFrom]);
  return {
    ...volume,
    setText: (text) => setVolume((now) => ({ ...now, text })),
    setUnit: (unit) => setVolume((now) => ({ ...now, unit })),
    fromBath: bath && filledFrom === bath.id ? bath.name : null,
  };
}
