import { demoPriceBook } from '../demo-price-book';
import type { Material, PriceBook } from '../price-book-schema';

// Test data: the demo book with round prices, so worked examples can be checked by hand.
const ROUND_COSTS: Record<string, string> = {
  'LINER-EPDM-45': '1.00',
  'UNDERLAY-8OZ': '0.50',
  'BOULDER-S': '100.00',
  'BOULDER-M': '100.00',
  'BOULDER-L': '100.00',
  'GRAVEL-RIVER-MIX': '50.00',
  'PIPE-PVC40-2': '2.00',
  'FIT-ELBOW90-2': '5.00',
  'FIT-CHECKVALVE-2': '40.00',
  'demo-mid-3000': '400.00',
  'SKIM-MID': '500.00',
  'FBOX-MID': '500.00',
  'LIGHT-LED-20': '50.00',
  'XFMR-150': '150.00',
  'CABLE-12': '1.00',
};

/**
 * The demo book with round numbers: the materials above at round costs; labor 20 / 32 / 24 per hour
 * with 25 % burden (25 / 40 / 30 burdened); a 300-a-day loader delivered for 100; disposal 40 per
 * loose yd³; markups materials 50 %, labor 50 %, equipment 20 %, disposal 10 %, other 0 %;
 * mobilization 200, minimum job 1000, contingency 10 %, sales tax 10 %, deposit 50 %; margin floor
 * 25 %, discount ceiling 10 %.
 */
export function roundPriceBook(): PriceBook {
  const book = demoPriceBook();
  return {
    ...book,
    materials: book.materials.map((material): Material => ({
      ...material,
      unitCost: ROUND_COSTS[material.code] ?? material.unitCost,
    })),
    laborRoles: [
      { code: 'LEAD', name: 'Crew lead', wagePerHour: '32.00', burdenPct: '25' },
      { code: 'INSTALLER', name: 'Installer', wagePerHour: '20.00', burdenPct: '25' },
      { code: 'LV-TECH', name: 'Low-voltage technician', wagePerHour: '24.00', burdenPct: '25' },
    ],
    equipment: book.equipment.map((item) =>
      item.code === 'MTL-36' ? { ...item, dailyRate: '300.00', deliveryFee: '100.00' } : item,
    ),
    disposal: book.disposal.map((item) =>
      item.code === 'HAUL-YD' ? { ...item, unitCost: '40.00' } : item,
    ),
    settings: {
      ...book.settings,
      mobilizationCost: '200.00',
      minimumJobPrice: '1000.00',
      contingencyPct: '10',
      salesTaxPct: '10',
      depositPct: '50',
    },
    policy: {
      markupPct: { materials: '50', labor: '50', equipment: '20', disposal: '10', other: '0' },
      marginFloorPct: '25',
      discountCeilingPct: '10',
    },
  };
}
