// biome-ignore-all lint/suspicious/noTemplateCurlyInString: these strings are VS Code snippets (${1:...} tab stops), not templates
/**
 * Lines that several methods' templates share: the material, the section and the loads of
 * a shaft. Inputs the engineer must supply are `?` placeholders (an error until filled),
 * never made-up numbers.
 */
import type { TemplateUnits } from './types';

export const TEMPLATE_UNITS: Record<'SI' | 'US', TemplateUnits> = {
  SI: {
    system: 'SI',
    stress: 'MPa',
    length: 'mm',
    moment: 'N*m',
    force: 'N',
    temp: 'degC',
    toughness: 'MPa*m^0.5',
  },
  US: {
    system: 'US',
    stress: 'ksi',
    length: 'in',
    moment: 'lbf*in',
    force: 'lbf',
    temp: 'degF',
    toughness: 'ksi*in^0.5',
  },
};

export function materialLines(u: TemplateUnits): string[] {
  return [
    `Sut = \${3:?} ${u.stress}`,
    `Sy = \${4:?} ${u.stress}`,
    'surface: ${5|machined,ground,cold-drawn,hot-rolled,as-forged|}',
    'rotation: ${6|rotating,non-rotating|}',
    `temp = \${7:?} ${u.temp}`,
    'reliability = ${8:0.99}',
  ];
}

export function sectionLines(u: TemplateUnits): string[] {
  return [
    `d = \${9:?} ${u.length}`,
    `D = \${10:?} ${u.length}`,
    `r = \${11:?} ${u.length}`,
    'feature: ${12|shoulder-fillet,groove,cross-hole,none|}',
  ];
}

export function loadLines(u: TemplateUnits): string[] {
  return [
    `M_max = \${13:?} ${u.moment}`,
    `M_min = \${14:?} ${u.moment}`,
    `T_max = \${15:?} ${u.moment}`,
    `T_min = \${16:?} ${u.moment}`,
  ];
}
