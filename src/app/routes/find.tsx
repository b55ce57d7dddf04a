import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page';
import { SafetyNote } from '@/features/cautions/safety-note';
import { FindBox } from '@/features/find/components/find-box';
import { RecipeExplanation } from '@/features/find/components/recipe-explanation';
import { ResultList } from '@/features/find/components/result-list';
import { useProgrammes } from '@/features/programmes';

/** A whole recipe code opens its explanation at once; anything else lists the matches first. */
const CODE = /^[A-Za-z]{2,5}-\d{4,6}$/;

export function FindRoute() {
  const [params, setParams] = useSearchParams();
  const q = params.get('q')?.trim() ?? '';
  const code = params.get('code');
  const programmes = useProgrammes({ archived: 'all' });
  const programmeName = (id: number) => programmes.data?.items.find((p) => p.id === id)?.name ?? null;
  return (
    <>
      <PageHeader title="Find" subtitle="Look a recipe up by its code, its name or what its notes say, and read where it sits and why." />
      <div className="mb-6">
        <FindBox key={q} initial={q} onSearch={(text) => setParams(!text ? {} : CODE.test(text) ? { q: text, code: text.toUpperCase() } : { q: text })} />
      </div>
      <div className="grid gap-6 lg:grid-cols-[17rem_1fr]">
        <ResultList q={q} selected={code} programmeName={programmeName} hrefFor={(recipe) => `/find?${new URLSearchParams({ q, code: recipe.code })}`} />
        {code ? (
          <RecipeExplanation code={code} programmeName={programmeName} cautions={<SafetyNote />} />
        ) : (
          q && <p className="text-sm text-ink-soft">Choose a recipe from the list to see where it sits.</p>
        )}
      </div>
    </>
  );
}
