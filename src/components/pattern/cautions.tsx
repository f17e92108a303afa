import { Notice } from '@/components/ui/notice.tsx';

const ALWAYS = [
  'Cut away from your body on a cutting mat; a sharp blade is safer than a dull one.',
  'Strike punches on a punching surface with a poly or rawhide mallet.',
  'Dyes, solvents and cements: ventilate, wear gloves, keep vapours away from flames and follow the product’s safety data sheet.',
  'Sizes are starting points: check on scrap and by fitting before cutting good leather.',
];

const PET = [
  'Check a collar’s fit with two fingers under it, and recheck growing animals.',
  'Use breakaway collars for cats; use slip collars only under supervision; take collars off in crates.',
];

const LOAD = 'This strap holds weight or restrains: the maker’s judgement, local codes and licensed practice come first.';

/** Shop-floor cautions, shown where a maker prints or downloads a template. */
export function Cautions({ kind }: { kind: string }) {
  const pet = kind === 'collar' || kind === 'leash';
  const load = kind === 'leash' || kind === 'bag-strap';
  return (
    <Notice tone="info" title="Before you cut" className="text-[0.8rem]">
      <ul className="list-disc space-y-0.5 pl-5" data-testid="cautions">
        {ALWAYS.map((c) => (
          <li key={c}>{c}</li>
        ))}
        {pet && PET.map((c) => <li key={c}>{c}</li>)}
        {load && <li>{LOAD}</li>}
      </ul>
    </Notice>
  );
}
