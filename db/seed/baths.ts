// Demo baths of the invented Harbourside Finishing shop: several processes, about four months of
// weekly analyses with the drift a working bath shows (silver plated out and topped up, free
// cyanide consumed and replenished, carbonate building up, a fixer loading with silver), a couple
// of results outside their targets, and one attached lab report. Target ranges and compositions
// are typical of the trade (common practice), not taken from any one published bath.
import { createHash, randomUUID } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';

import { eq } from 'drizzle-orm';

import type { Db } from '@/db/client';
import { analyses, attachments, baths } from '@/db/schema';
import { toStored } from '@/lib/baths/quantities';
import { bathColumns, bathOf } from '@/server/baths/store';
import { type BathInput, bathInputSchema } from '@/shared/baths';

import { DEMO_TEAM } from './team';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

const CHEMIST = DEMO_TEAM[0].id;
const TECHNICIAN = DEMO_TEAM[1].id;

/** One demo bath: its record, and how its analyses move week by week (values in the bath's units). */
interface DemoBathPlan {
  bath: BathInput;
  by: string;
  analyst: string;
  weeks: number;
  /** The results of week w (0 = oldest), in the bath's units; pH as pH. */
  week: (w: number, noise: () => number) => { metal?: number; freeLigand?: number; totalLigand?: number; pH?: number; carbonate?: number; bromide?: number; notes?: string };
}

/** A small deterministic generator, so every demo database holds the same numbers. */
function noiseFrom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s * 1664525 + 1013904223) >>> 0;
    return s / 2 ** 32 - 0.5;
  };
}

const round = (x: number, places: number) => Math.round(x * 10 ** places) / 10 ** places;

export const DEMO_BATH_PLANS: readonly DemoBathPlan[] = [
  {
    bath: {
      name: 'Bright silver, line 2',
      process: 'cyanide_silver_plate',
      volume: 1200,
      volumeUnit: 'L',
      temperatureC: 22,
      makeUp: [
        { salt: 'K[Ag(CN)2]', amount: 60, unit: 'g/L' },
        { salt: 'KCN', amount: 120, unit: 'g/L' },
        { salt: 'K2CO3', amount: 15, unit: 'g/L' },
      ],
      targets: { metal: { min: 28, max: 36 }, freeLigand: { min: 90, max: 140 }, pH: { min: 11.5, max: 12.8 } },
      site: 'Harbourside, hall B',
      notes: 'Rack line for connector contacts. Anodes: fine silver.',
    },
    by: CHEMIST,
    analyst: 'T. Okafor',
    weeks: 17,
    // Silver drifts down between top-ups every fourth week; free KCN is consumed and replenished;
    // carbonate creeps up. Week 11 missed a cyanide addition: free KCN below range.
    week: (w, n) => ({
      metal: round(34 - 1.4 * (w % 4) + n() * 0.8, 1),
      freeLigand: round(w === 11 ? 84 : 128 - 7 * (w % 3) + n() * 4, 1),
      totalLigand: round(171 - 7 * (w % 3) + n() * 5, 1),
      pH: round(12.2 + n() * 0.2, 2),
      carbonate: round(38 + 2.1 * w + n() * 3, 1),
    }),
  },
  {
    bath: {
      name: 'Silver strike, line 2',
      process: 'silver_strike',
      volume: 400,
      volumeUnit: 'L',
      temperatureC: 22,
      makeUp: [
        { salt: 'K[Ag(CN)2]', amount: 4, unit: 'g/L' },
        { salt: 'KCN', amount: 90, unit: 'g/L' },
      ],
      targets: { metal: { min: 1.5, max: 3.5 }, freeLigand: { min: 70, max: 110 }, pH: { min: 11.5, max: 12.8 } },
      site: 'Harbourside, hall B',
      notes: 'High cyanide, low silver: strikes before the bright bath.',
    },
    by: CHEMIST,
    analyst: 'T. Okafor',
    weeks: 17,
    week: (w, n) => ({ metal: round(2.4 + 0.05 * (w % 5) + n() * 0.2, 2), freeLigand: round(96 - 2 * (w % 4) + n() * 3, 1), pH: round(12.3 + n() * 0.15, 2), carbonate: round(20 + 1.2 * w + n() * 2, 1) }),
  },
  {
    bath: {
      name: 'Copper strike, rack line',
      process: 'cyanide_copper',
      volume: 800,
      volumeUnit: 'L',
      temperatureC: 45,
      makeUp: [
        { salt: 'CuCN', amount: 22, unit: 'g/L' },
        { salt: 'NaCN', amount: 32, unit: 'g/L' },
        { salt: 'Na2CO3', amount: 15, unit: 'g/L' },
      ],
      targets: { metal: { min: 13, max: 18 }, freeLigand: { min: 4, max: 10 }, pH: { min: 12.0, max: 12.8 } },
      site: 'Harbourside, hall A',
      notes: 'Strike on steel before acid copper.',
    },
    by: CHEMIST,
    analyst: 'M. Lindqvist',
    weeks: 16,
    week: (w, n) => ({ metal: round(15.5 - 0.3 * (w % 4) + n() * 0.5, 2), freeLigand: round(7.2 - 0.6 * (w % 3) + n() * 0.6, 2), pH: round(12.4 + n() * 0.2, 2), carbonate: round(25 + 1.8 * w + n() * 2, 1) }),
  },
  {
    bath: {
      name: 'Gold strike, selective cell',
      process: 'gold_strike',
      volume: 10,
      volumeUnit: 'gal',
      temperatureC: 50,
      makeUp: [
        { salt: 'K[Au(CN)2]', amount: 3, unit: 'g/L' },
        { salt: 'KCN', amount: 15, unit: 'g/L' },
      ],
      metalUnit: 'troy oz/gal',
      targets: { metal: { min: 0.2, max: 0.35 }, freeLigand: { min: 10, max: 25 }, pH: { min: 11, max: 12.5 } },
      site: 'Harbourside, clean room',
      notes: 'Small cell; gold stated in troy ounces per gallon as the supplier quotes it.',
    },
    by: CHEMIST,
    analyst: 'M. Lindqvist',
    weeks: 9,
    week: (w, n) => ({ metal: round(0.3 - 0.012 * w + n() * 0.01, 3), freeLigand: round(18 - 0.4 * w + n() * 1, 1), pH: round(11.8 + n() * 0.2, 2) }),
  },
  {
    bath: {
      name: 'Fixer tank A, radiography',
      process: 'thiosulfate_fixer',
      volume: 120,
      volumeUnit: 'L',
      temperatureC: 24,
      makeUp: [{ salt: '(NH4)2S2O3', amount: 160, unit: 'g/L' }],
      targets: { metal: { min: null, max: 6 }, freeLigand: { min: 110, max: null }, pH: { min: 4.0, max: 5.5 } },
      site: 'Harbourside, film processing',
      notes: 'Silver recovered by electrolysis when it nears 6 g/L; fixer replaced at exhaustion.',
    },
    by: TECHNICIAN,
    analyst: 'T. Okafor',
    weeks: 16,
    // Silver loads steadily; recovery at week 8 brings it back down; the latest result is over 6 g/L.
    week: (w, n) => {
      const loaded = w < 8 ? 0.7 * w : 0.75 * (w - 8) + 0.6;
      return {
        metal: round(0.4 + loaded + n() * 0.15, 2),
        freeLigand: round(150 - 2.5 * (w < 8 ? w : w - 8) + n() * 3, 1),
        pH: round(4.7 + n() * 0.2, 2),
        bromide: round(0.6 + 0.35 * (w < 8 ? w : w - 8) + n() * 0.1, 2),
        ...(w === 8 ? { notes: 'After electrolytic silver recovery.' } : {}),
      };
    },
  },
  {
    bath: {
      name: 'Fixer tank B, minilab',
      process: 'thiosulfate_fixer',
      volume: 25,
      volumeUnit: 'L',
      temperatureC: 35,
      makeUp: [{ salt: '(NH4)2S2O3', amount: 140, unit: 'g/L' }],
      targets: { metal: { min: null, max: 5 }, freeLigand: { min: 100, max: null }, pH: { min: 4.2, max: 5.5 } },
      site: 'Harbourside, film processing',
      notes: '',
    },
    by: TECHNICIAN,
    analyst: 'T. Okafor',
    weeks: 6,
    // Not analysed for the last three weeks: the list shows it as due.
    week: (w, n) => ({ metal: round(1 + 0.6 * w + n() * 0.1, 2), freeLigand: round(135 - 3 * w + n() * 2, 1), pH: round(4.9 + n() * 0.15, 2) }),
  },
];

/** Sampling days: Tuesdays, the newest `endWeeksAgo` weeks before `today`. */
function sampleDate(today: Date, weeks: number, w: number, endWeeksAgo: number): Date {
  const d = new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate(), 9, 30));
  const back = (weeks - 1 - w + endWeeksAgo) * 7;
  d.setUTCDate(d.getUTCDate() - back - ((d.getUTCDay() + 5) % 7));
  return d;
}

/** A one-page PDF with a few lines of text (a stand-in lab report for the demo). */
export function demoReportPdf(lines: string[]): Buffer {
  const text = lines.map((l, i) => `BT /F1 11 Tf 56 ${760 - i * 18} Td (${l.replace(/[()\\]/g, '\\$&')}) Tj ET`).join('\n');
  const objects = [
    '<< /Type /Catalog /Pages 2 0 R >>',
    '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
    '<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] /Resources << /Font << /F1 4 0 R >> >> /Contents 5 0 R >>',
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica >>',
    `<< /Length ${Buffer.byteLength(text, 'latin1')} >>\nstream\n${text}\nendstream`,
  ];
  let body = '%PDF-1.4\n';
  const offsets: number[] = [];
  objects.forEach((o, i) => {
    offsets.push(Buffer.byteLength(body, 'latin1'));
    body += `${i + 1} 0 obj\n${o}\nendobj\n`;
  });
  const xref = Buffer.byteLength(body, 'latin1');
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n${offsets.map((o) => `${String(o).padStart(10, '0')} 00000 n \n`).join('')}`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return Buffer.from(body, 'latin1');
}

/** Adds the demo baths that are missing (by name), their analyses and the one attachment. Returns how many baths were added. */
export async function seedBaths(tx: Tx, uploadsDir: string, today = new Date()): Promise<{ baths: number; files: string[] }> {
  let added = 0;
  const files: string[] = [];
  for (const [i, plan] of DEMO_BATH_PLANS.entries()) {
    const existing = await tx.select({ id: baths.id }).from(baths).where(eq(baths.name, plan.bath.name));
    if (existing.length > 0) continue;
    const fields = bathInputSchema.parse(plan.bath);
    const columns = await bathColumns(tx, fields, plan.by);
    const [row] = await tx.insert(baths).values({ id: randomUUID(), ...columns, createdBy: plan.by }).returning();
    if (!row) throw new Error('demo bath not stored');
    const bath = await bathOf(tx, row);
    const noise = noiseFrom(7919 * (i + 1));
    const endWeeksAgo = plan.bath.name.includes('minilab') ? 3 : 0;
    for (let w = 0; w < plan.weeks; w++) {
      const v = plan.week(w, noise);
      const entered: Record<string, { value: number; unit: string | null }> = {};
      const stored = (q: 'metal' | 'freeLigand' | 'totalLigand' | 'carbonate' | 'bromide') => {
        const value = v[q];
        if (value === undefined) return null;
        const unit = q === 'metal' ? bath.metalUnit : bath.ligandUnit;
        entered[q] = { value, unit };
        return toStored(bath, q, value, unit);
      };
      const values = {
        metalMolL: stored('metal'),
        freeLigandMolL: stored('freeLigand'),
        totalLigandMolL: stored('totalLigand'),
        carbonateMolL: stored('carbonate'),
        bromideMolL: stored('bromide'),
      };
      if (v.pH !== undefined) entered.pH = { value: v.pH, unit: null };
      await tx.insert(analyses).values({
        id: randomUUID(),
        bathId: row.id,
        sampledAt: sampleDate(today, plan.weeks, w, endWeeksAgo),
        analyst: plan.analyst,
        ...values,
        ph: v.pH ?? null,
        entered,
        notes: v.notes ?? '',
        source: 'manual',
        enteredBy: plan.by,
      });
    }
    if (plan.bath.process === 'cyanide_silver_plate') {
      const pdf = demoReportPdf([
        'Harbourside Finishing - bath assay (invented demo report)',
        `Bath: ${plan.bath.name}`,
        'Silver 33.8 g/L; free KCN 124 g/L; carbonate 61 g/L (as K2CO3); pH 12.2',
        'Method: silver by thiocyanate titration, free cyanide by silver nitrate titration.',
        'Demo data: not a real laboratory result.',
      ]);
      const id = randomUUID();
      const storageKey = `${id}.pdf`;
      await fs.mkdir(uploadsDir, { recursive: true });
      await fs.writeFile(path.join(uploadsDir, storageKey), pdf);
      files.push(path.join(uploadsDir, storageKey));
      await tx.insert(attachments).values({
        id,
        bathId: row.id,
        title: 'Monthly assay, outside lab',
        fileName: 'assay-bright-silver-line-2.pdf',
        contentType: 'application/pdf',
        sizeBytes: pdf.length,
        sha256: createHash('sha256').update(pdf).digest('hex'),
        storageKey,
        uploadedBy: TECHNICIAN,
      });
    }
    added++;
  }
  return { baths: added, files };
}
