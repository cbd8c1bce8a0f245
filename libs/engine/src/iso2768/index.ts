export { iso2768Method, type Iso2768Outputs } from './iso2768.method.js';
export { iso2768AngularMethod, type Iso2768AngularOutputs } from './iso2768-angular.method.js';
export { iso2768GeometricMethod, type Iso2768GeometricOutputs } from './iso2768-geometric.method.js';
export { parseGeneralToleranceDesignation } from './parse-general-tolerance-designation.js';
