// The shared calculator UI: used by the reading view of a standard and by the editor's block node view.
export { MethodInputsForm, type MethodInputsFormProps } from './method-inputs-form';
export { ResultPanel, VerdictBadge, type ResultPanelProps } from './result-panel';
export { DerivationSteps } from './derivation-steps';
export { UnitToggle } from './unit-toggle';
export { CalculatorBlockView, blockRequest, type CalculatorBlockConfig, type CalculatorBlockViewProps } from './calculator-block-view';
export { useBlockEvaluation, type UseBlockEvaluationOptions } from './use-block-evaluation';
export { useMethods, getMethodsQueryOptions } from './api/get-methods';
export { evaluateBatch, evaluateOne, evaluationKey, evaluationQueryOptions, seedEvaluations, type EvaluationOutcome, type EvaluationRequest } from './api/evaluate';
export { deriveEvaluationView, type EvaluationState, type EvaluationView } from './lib/evaluation-state';
export { acceptanceInWords, outputPathLabel, ruleForRequest } from './lib/acceptance-words';
export { describeInputs, getAtPath, hasLengthInput, setAtPath, type Field, type JsonSchema } from './lib/json-schema';
export { convertInputs, convertLength } from './lib/units';
export { formatNumber, parseNumberText } from './lib/format-number';
