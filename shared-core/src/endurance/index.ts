export { rotatingBeamEndurance } from './enduranceLimit';
export { fatigueStrengthFraction } from './strengthFraction';
