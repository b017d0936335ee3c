export { HAZARD_LABELS, SAFETY_DEFERRAL } from '../../../../shared/constants';
