import type { PlanView } from '@shared/views/plan';
import type { ProgrammeView } from '@shared/views/programme';
import { STATE_LABELS } from '@shared/states';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { formatNumber } from '@/lib/format';
import { useUrlParams } from '@/lib/use-url-params';
import { SafetyNote } from '@/features/cautions';
import { useLiveMaterials } from '@/features/library';
import { PlanMap } from '@/features/map';
import { useCreatePlan } from '../api/create-plan';
import { usePlan } from '../api/get-plan';
import { doseText } from '../lib/plan-words';
import { ExperimentList } from './experiment-list';
import { PlanAdviceNotice } from './plan-advice';
import { PlanCandidates } from './plan-candidates';
import { PlanForm, defaultPlanInput } from './plan-form';
import { PlanHistory } from './plan-history';
import { PlanOverview } from './plan-overview';

const PLAN_PARAM = 'plan';

/**
 * The planner of one programme: the form (for roles that may plan), the open plan (?plan=ID) with
 * its place on the state map, ranked candidates or advice, next experiments, and the programme's plans.
 */
export function PlannerScreen({ programme, canPlan }: { programme: ProgrammeView; canPlan: boolean }) {
  const [params, setParams] = useUrlParams();
  const raw = Number(params.get(PLAN_PARAM));
  const planId = Number.isInteger(raw) && raw > 0 ? raw : null;
  const plan = usePlan(planId);
  const shown = plan.data && plan.data.programmeId === programme.id ? plan.data : null;
  const open = (id: number) => setParams((previous) => {
    const next = new URLSearchParams(previous);
    next.set(PLAN_PARAM, String(id));
    return next;
  });
  return (
    <div className="flex flex-col gap-5">
      {canPlan ? (
        <Card title="What to plan">
          <PlanFormLoader programme={programme} from={shown} onPlanned={(p) => open(p.id)} />
        </Card>
      ) : (
        <Notice title="Plans are made by formulators">You can read every plan of this programme and where its recipes came from; formulators and administrators run the planner.</Notice>
      )}
      {planId === null ? (
        <EmptyState title="No plan open">{canPlan ? 'Fill in what you want and choose Plan compositions, or open an earlier plan below.' : 'Open a plan from the list below.'}</EmptyState>
      ) : plan.isPending ? (
        <Loading label="Loading the plan…" />
      ) : plan.isError ? (
        <ErrorState error={plan.error} retry={() => plan.refetch()} />
      ) : shown ? (
        <PlanResult key={shown.id} plan={shown} canPlan={canPlan} onPlanned={(p) => open(p.id)} />
      ) : (
        <Notice tone="warning">That plan belongs to another programme; choose it above to see it.</Notice>
      )}
      <Card title="Plans of this programme">
        <PlanHistory programmeId={programme.id} current={shown?.id ?? null} onOpen={open} />
      </Card>
    </div>
  );
}

/** The form, once the library is loaded: the open plan's request, or the programme's defaults. */
function PlanFormLoader({ programme, from, onPlanned }: { programme: ProgrammeView; from: PlanView | null; onPlanned: (plan: PlanView) => void }) {
  const particles = useLiveMaterials('particles');
  const solvents = useLiveMaterials('solvents');
  const depletants = useLiveMaterials('depletants');
  const salts = useLiveMaterials('salts');
  const all = [particles, solvents, depletants, salts];
  if (all.some((q) => q.isPending)) return <Loading label="Loading the library…" />;
  const failed = all.find((q) => q.isError);
  if (failed) return <ErrorState error={failed.error} retry={() => failed.refetch()} />;
  const first = (items: { id: number; archived: boolean }[] | undefined) => items?.find((m) => !m.archived)?.id ?? 0;
  const ids = { particleId: first(particles.data), solventId: first(solvents.data), depletantId: first(depletants.data), saltId: first(salts.data) };
  if (!ids.particleId || !ids.solventId || (!ids.depletantId && !ids.saltId)) {
    return <EmptyState title="The library is not ready">Planning needs a particle system, a solvent and a polymer or a salt in the library.</EmptyState>;
  }
  const initial = from ? { ...from.inputs, title: undefined } : defaultPlanInput(programme, ids);
  return <PlanForm key={from?.id ?? 'new'} initial={initial} onPlanned={onPlanned} />;
}

function PlanResult({ plan, canPlan, onPlanned }: { plan: PlanView; canPlan: boolean; onPlanned: (plan: PlanView) => void }) {
  const again = useCreatePlan();
  const target = STATE_LABELS[plan.targetState].toLowerCase();
  const marks = {
    candidates: plan.outcome.candidates.map((c) => ({ number: c.index + 1, phi: c.phi, y: c.mapY, made: c.recipe !== null, label: `Candidate ${c.index + 1}: φ ${c.phi.toFixed(3)}, ${doseText(plan, c.level)}; predicted ${c.derived.predictedState ?? '—'}, margin ${formatNumber(c.derived.margin, 2)}` })),
    experiments: plan.outcome.experiments.items.map((e) => ({ number: e.index + 1, phi: e.phi, y: e.mapY, made: e.recipe !== null, label: `Next experiment ${e.index + 1}: φ ${e.phi.toFixed(3)}, ${doseText(plan, e.level)}; ${Math.round(e.probability * 100)} % chance of ${target}` })),
  };
  return (
    <>
      <div className="grid gap-5 lg:grid-cols-2">
        <Card title={`Plan ${plan.id} · ${plan.title}`}>
          <PlanOverview plan={plan} />
        </Card>
        <Card title="On the state map">
          <PlanMap
            model={plan.map.model}
            parameters={plan.map.parameters}
            polydispersity={plan.map.polydispersity}
            searched={plan.outcome.window.searched}
            feasible={plan.outcome.window.feasible}
            candidates={marks.candidates}
            experiments={marks.experiments}
            title={`plan ${plan.id}`}
            height={420}
          />
          <p className="mt-3 text-xs text-ink-soft" data-testid="plan-map-key">
            Dashed outline: the ranges searched. Shaded: where the {target} is predicted with at least the margin asked (the feasible window). Numbered discs: candidates, filled once made into recipes. Numbered diamonds: next experiments. Lines are approximate theory{plan.calibration ? ', calibrated to the bench' : ''}.
          </p>
        </Card>
      </div>
      {plan.outcome.feasible ? (
        <Card title="Ranked candidates">
          <PlanCandidates plan={plan} canMake={canPlan} />
        </Card>
      ) : (
        <PlanAdviceNotice plan={plan} busy={again.isPending} onTry={canPlan ? (input) => again.mutate(input, { onSuccess: onPlanned }) : null} />
      )}
      <Card title="Next experiments">
        <ExperimentList plan={plan} canSend={canPlan} />
      </Card>
      <SafetyNote compact />
    </>
  );
}
