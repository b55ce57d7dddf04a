import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextInput } from '@/components/ui/inputs';

/** One search box; the search runs when the person presses Enter or the button. */
export function FindBox({ initial, onSearch }: { initial: string; onSearch: (q: string) => void }) {
  const [text, setText] = useState(initial);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSearch(text.trim());
  };
  return (
    <form role="search" onSubmit={submit} className="flex max-w-2xl flex-col gap-1">
      <label htmlFor="find-q" className="text-sm font-medium">
        Recipe code, name or words from its notes
      </label>
      <div className="flex gap-2">
        <TextInput id="find-q" type="search" value={text} onChange={(event) => setText(event.target.value)} placeholder="e.g. HB-0012, thixotropic primer" autoFocus={!initial} />
        <Button type="submit">Find</Button>
      </div>
    </form>
  );
}
