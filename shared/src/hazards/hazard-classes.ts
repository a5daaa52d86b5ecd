import type { HazardClassId } from './types.js';

/** A hazard class's display name and the protective cautions that go with it. */
export interface HazardClassInfo {
  readonly name: string;
  /** Cautions of the trade (common practice), shown on the caution card of any candidate with this class. */
  readonly cautions: readonly string[];
}

const TOXIC_AIR =
  'Toxic by inhalation: stay upwind and uphill, keep out of low areas, and evacuate to the isolation distance your agency sets (common practice).';
const FIRE = 'Flammable: remove ignition sources, use non-sparking tools, no open flames (common practice).';
const OXIDISER = 'Oxidiser: keep away from fuels, organic matter and reducing agents; may intensify fire (common practice).';
const CORROSIVE = 'Corrosive: chemical-resistant gloves, eye and face protection; avoid contact and splashes (common practice).';
const HEALTH = 'Long-term health hazard: minimise exposure, use respiratory protection as your procedures require (common practice).';

/** GHS hazard classes with our display names (class names per GHS Rev. 9, from memory) and cautions. */
export const HAZARD_CLASSES: Readonly<Record<HazardClassId, HazardClassInfo>> = {
  explosive: {
    name: 'Explosive',
    cautions: [
      'Possible explosive: do not move, open, grind or heat the sample; no friction or impact; clear the area and call explosive-ordnance specialists (common practice).',
    ],
  },
  'flammable-gas': { name: 'Flammable gas', cautions: [FIRE, 'Flammable gas: ventilate, check with a gas detector before entry (common practice).'] },
  'chemically-unstable-gas': {
    name: 'Chemically unstable gas',
    cautions: ['Unstable gas: may decompose explosively; no heat or shock to the container (common practice).'],
  },
  'oxidising-gas': { name: 'Oxidising gas', cautions: [OXIDISER] },
  'gas-under-pressure': {
    name: 'Gas under pressure',
    cautions: ['Pressurised container: protect from heat, do not puncture; liquefied gases cause cold burns (common practice).'],
  },
  'flammable-liquid': { name: 'Flammable liquid', cautions: [FIRE] },
  'flammable-solid': { name: 'Flammable solid', cautions: [FIRE] },
  'self-reactive': {
    name: 'Self-reactive substance',
    cautions: ['Self-reactive: may decompose violently when heated; keep cool, do not confine (common practice).'],
  },
  pyrophoric: { name: 'Pyrophoric', cautions: ['Ignites in air: keep under inert cover, never expose to air (common practice).'] },
  'water-reactive': {
    name: 'Emits flammable gas in contact with water',
    cautions: ['Water-reactive: keep dry, do not use water on spills or fires (common practice).'],
  },
  'oxidising-liquid': { name: 'Oxidising liquid', cautions: [OXIDISER] },
  'oxidising-solid': { name: 'Oxidising solid', cautions: [OXIDISER] },
  'organic-peroxide': {
    name: 'Organic peroxide',
    cautions: ['Organic peroxide: heat, friction or contamination can start violent decomposition (common practice).'],
  },
  'corrosive-to-metals': { name: 'Corrosive to metals', cautions: ['Corrodes metals: check containers and fittings for leaks (common practice).'] },
  'acute-toxicity-oral': { name: 'Acute toxicity (oral)', cautions: ['Toxic if swallowed: no eating, drinking or smoking; wash hands (common practice).'] },
  'acute-toxicity-dermal': { name: 'Acute toxicity (dermal)', cautions: ['Toxic through skin: wear chemical-resistant gloves and suit (common practice).'] },
  'acute-toxicity-inhalation': { name: 'Acute toxicity (inhalation)', cautions: [TOXIC_AIR] },
  'skin-corrosion-irritation': { name: 'Skin corrosion / irritation', cautions: [CORROSIVE] },
  'serious-eye-damage-irritation': { name: 'Serious eye damage / eye irritation', cautions: ['Eye hazard: wear eye protection; know where the eyewash is (common practice).'] },
  'respiratory-sensitisation': { name: 'Respiratory sensitisation', cautions: [HEALTH] },
  'skin-sensitisation': { name: 'Skin sensitisation', cautions: ['Skin sensitiser: avoid skin contact, wear gloves (common practice).'] },
  'germ-cell-mutagenicity': { name: 'Germ cell mutagenicity', cautions: [HEALTH] },
  carcinogenicity: { name: 'Carcinogenicity', cautions: [HEALTH] },
  'reproductive-toxicity': { name: 'Reproductive toxicity', cautions: [HEALTH] },
  'stot-single-exposure': { name: 'Specific target organ toxicity (single exposure)', cautions: [HEALTH] },
  'stot-repeated-exposure': { name: 'Specific target organ toxicity (repeated exposure)', cautions: [HEALTH] },
  'aspiration-hazard': { name: 'Aspiration hazard', cautions: ['Aspiration hazard: if swallowed, do not induce vomiting; get medical help (common practice).'] },
  'aquatic-acute': { name: 'Hazardous to the aquatic environment (acute)', cautions: ['Environmental hazard: keep out of drains and waterways (common practice).'] },
  'aquatic-chronic': { name: 'Hazardous to the aquatic environment (chronic)', cautions: ['Environmental hazard: keep out of drains and waterways (common practice).'] },
  'ozone-layer': { name: 'Hazardous to the ozone layer', cautions: ['Ozone-depleting: contain releases (common practice).'] },
};

/** Cautions for field markers that GHS classes do not carry (common practice). */
export const FLAG_CAUTIONS: Readonly<Record<string, string>> = {
  'explosive-precursor':
    'Explosive precursor (restricted under Regulation (EU) 2019/1148, from memory): look for signs of manufacture — other precursors, fuels, improvised containers — and secure the scene (common practice).',
  energetic:
    'Energetic material: may detonate or deflagrate; do not heat, grind or scan with a laser at high power (common practice).',
  'peroxide-former': 'May form explosive peroxides on storage: do not open old or crystallised containers (common practice).',
  asphyxiant: 'Asphyxiant: displaces oxygen in enclosed or low spaces; check oxygen level before entry (common practice).',
};

/** Whether a string is one of the GHS hazard class ids. */
export function isHazardClassId(id: string): id is HazardClassId {
  return Object.prototype.hasOwnProperty.call(HAZARD_CLASSES, id);
}
