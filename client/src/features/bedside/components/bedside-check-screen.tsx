import { type Drug, syringeState, type OrderDetail } from '@lockstep/shared';
import { usePatient } from '@/api/patients/get-patient';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { useCurrentUser } from '@/lib/auth/use-session';
import { CHECK_STEPS, useBedsideCheck } from '../hooks/use-bedside-check';
import { BedsideOrderPage } from './bedside-order-page';
import { BedsideSteps, type BedsideStep } from './bedside-steps';
import { CheckResult } from './check-result';
import { FirstCheckStep } from './first-check-step';
import { IdentifyStep } from './identify-step';
import { OrderNotice } from './order-notice';
import { SecondCheckStep } from './second-check-step';
import { SyringeStep } from './syringe-step';

export interface BedsideCheckScreenProps {
  orderId: number;
  drugs: readonly Drug[];
}

/** The guided two-nurse bedside check of one order, from the wristband to the comparison. */
export function BedsideCheckScreen({ orderId, drugs }: BedsideCheckScreenProps) {
  return (
    <BedsideOrderPage orderId={orderId} title="Bedside check">
      {(order) => <BedsideCheck order={order} drugs={drugs} />}
    </BedsideOrderPage>
  );
}

/** Why this order cannot be checked now, or null when it can. Only asked before a check begins. */
function notCheckable(order: OrderDetail) {
  if (order.status !== 'verified' && order.status !== 'active') {
    return <OrderNotice title="No bedside check for this order">This order is not waiting for a bedside check.</OrderNotice>;
  }
  const syringes = syringeState(order.releases);
  if (syringes === 'running') {
    return (
      <OrderNotice title="A syringe is running" action={{ label: 'Change syringe', to: paths.bedsideSyringeChange.getHref(order.id) }}>
        Record the syringe change (old syringe and witnessed waste) first; then check the new syringe.
      </OrderNotice>
    );
  }
  if (syringes === 'none') {
    return (
      <OrderNotice title="No syringe released yet">
        Pharmacy has not released a syringe for this order. Check again when it arrives.
      </OrderNotice>
    );
  }
  return null;
}

function BedsideCheck({ order, drugs }: { order: OrderDetail; drugs: readonly Drug[] }) {
  const user = useCurrentUser();
  // For comparing the wristband as soon as it is typed; never shown: the identifiers must come
  // from the wristband, not from the screen.
  const patient = usePatient(order.patientId);
  const check = useBedsideCheck();
  const { state } = check;

  const steps: BedsideStep[] = [
    { label: 'Patient', description: 'Wristband' },
    { label: 'Syringe', description: 'Release code' },
    { label: 'First check', description: user.displayName },
    { label: 'Second check', description: 'Second nurse' },
    { label: 'Result', description: 'Compared with the order', color: state.result?.status === 'mismatch' ? 'red' : undefined },
  ];
  const stepCount = steps.length;
  const matched = state.result?.status === 'matched';
  const active = matched ? stepCount : CHECK_STEPS.indexOf(state.step);

  if (state.checkId === null) {
    const notice = notCheckable(order);
    if (notice) return notice;
  }

  // Keyed by round: a new check remounts every step, so every form starts empty again.
  const key = `${state.round}-${state.step}`;
  let step;
  switch (state.step) {
    case 'identify':
      step = (
        <IdentifyStep
          key={key}
          patient={patient.data}
          initialValues={state.identity}
          bounced={state.bounced}
          stepCount={stepCount}
          onNext={check.identified}
        />
      );
      break;
    case 'syringe':
      step = (
        <SyringeStep
          key={key}
          releases={order.releases}
          initialCode={state.releaseCode}
          bounced={state.bounced}
          stepCount={stepCount}
          onNext={check.syringeScanned}
          onBack={() => check.goBack('identify')}
        />
      );
      break;
    case 'first':
      step = (
        <FirstCheckStep
          key={key}
          order={order}
          drugs={drugs}
          nurseName={user.displayName}
          identity={state.identity}
          releaseCode={state.releaseCode}
          draft={state.firstDraft}
          stepCount={stepCount}
          onSent={(checkId) => check.firstSent(checkId, order.status === 'active')}
          onBounced={check.firstBounced}
          onBack={() => check.goBack('syringe')}
        />
      );
      break;
    case 'second':
      step = (
        <SecondCheckStep
          key={key}
          order={order}
          drugs={drugs}
          checkId={state.checkId ?? 0}
          firstNurseName={user.displayName}
          stepCount={stepCount}
          onCompared={check.compared}
          onRestart={check.restart}
        />
      );
      break;
    case 'result':
      step = state.result ? (
        <CheckResult
          key={key}
          order={order}
          result={state.result}
          newSyringe={state.newSyringe}
          completedAt={state.completedAt ?? new Date().toISOString()}
          nurses={{ first: user.displayName, second: state.secondUsername ?? 'second nurse' }}
          drugs={drugs}
          stepCount={stepCount}
          onRestart={check.restart}
        />
      ) : null;
      break;
  }

  return (
    <>
      <BedsideSteps steps={steps} active={active} label="Bedside check steps" />
      {state.step === 'identify' && patient.isError ? (
        <QueryErrorAlert
          title="The patient’s details could not be loaded to compare with"
          error={patient.error}
          onRetry={() => void patient.refetch()}
        />
      ) : null}
      {step}
    </>
  );
}
