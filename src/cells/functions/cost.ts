import { loadLossWorth, lossEnergyCost, noLoadLossWorth, totalOwningCost } from '../../core/cost';
import { loads, losses, stepHours } from '../arguments';
import { inGroup, num } from '../declaration';

const { each } = inGroup('Cost');
const price = num('price_kwh', 'money/kWh', 'Price of a kWh of energy lost, in your currency.', 0.12);
const rate = num('rate', 'fraction', 'Interest (discount) rate a year, e.g. 6%; 0 for no discounting. No default: it is your evaluation policy.', 0.06);
const years = num('years', 'years', 'Evaluation period, a whole number of years from 1 to 100. No default: it is your evaluation policy.', 25);
const hoursAYear = num('hours', 'h', 'Hours energised a year, up to 8,784.', 8760, { default: 8760 });
const demand = num('demand_kw_year', 'money/kW·year', 'Demand (capacity) charge for each kW of peak a year; blank or 0 for energy only.', 60, { default: 0 });
/** The evaluation's terms, which the A and B factors both take after what each prices. */
const evaluation = [rate, years, hoursAYear, demand] as const;
/** The capitalisation both factors follow; each adds how it treats the demand charge. */
const CAPITALISATION = 'present worth of a level annuity applied to loss energy (common practice; loss capitalisation as stated in manufacturers’ guidance)';

export const AFACTOR = each({
  name: 'AFACTOR',
  help: 'A factor: present worth of one watt of no-load loss, (price_kwh × hours + demand_kw_year) / 1000 × (1 − (1 + rate)^−years) / rate (× years when rate is 0).',
  source: `${CAPITALISATION}; demand charge as in IEEE C57.120 loss evaluation (from memory)`,
  args: [price, ...evaluation],
  result: { type: 'number', unit: 'money/W' },
  compute: noLoadLossWorth,
});

export const BFACTOR = each({
  name: 'BFACTOR',
  help: 'B factor: present worth of one watt of rated load loss, (price_kwh × hours × loss_factor + demand_kw_year × responsibility²) / 1000 × the present-worth factor × peak_load².',
  source: `${CAPITALISATION}; demand charge and responsibility factor as in IEEE C57.120 loss evaluation (from memory)`,
  args: [
    price,
    num('loss_factor', 'fraction', 'Loss factor of the yearly loading, 0 to 1: mean of load² over peak² (see LOSSFACTOR, LSF).', 0.35),
    num('peak_load', 'per unit', 'Peak load of the year as a fraction of nameplate kVA.', 0.8),
    ...evaluation,
    num('responsibility', 'fraction', 'Responsibility factor: the unit’s load at the system peak over its own peak, 0 to 1 (used squared); blank for 1.', 0.9, {
      default: 1,
    }),
  ],
  result: { type: 'number', unit: 'money/W' },
  compute: loadLossWorth,
});

export const TOC = each({
  name: 'TOC',
  help: 'Total owning cost: price + a × p0_w + b × pk_w, with a and b from AFACTOR and BFACTOR.',
  source: 'total owning cost, TOC = price + A·P0 + B·Pk (common practice)',
  args: [
    num('price', 'money', 'Purchase price of the unit.', 18500),
    ...losses,
    num('a', 'money/W', 'Worth of a watt of no-load loss (AFACTOR).', 10.5),
    num('b', 'money/W', 'Worth of a watt of rated load loss (BFACTOR).', 2.1),
  ],
  result: { type: 'number', unit: 'money' },
  compute: totalOwningCost,
});

export const LOSSCOST = each({
  name: 'LOSSCOST',
  help: 'Cost of the energy lost over a loading profile, not discounted: Σ (p0_w + pk_w × load²) × hours / 1000 × price_kwh.',
  source: 'common practice',
  args: [
    ...losses,
    loads,
    price,
    stepHours,
  ],
  result: { type: 'number', unit: 'money' },
  compute: lossEnergyCost,
});
