/** A person's initials in a circle; decorative, the name is always written next to it. */
export function InitialsAvatar({ name }: { name: string }) {
  const initials = name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((part) => part[0]?.toUpperCase())
    .join('');
  return (
    <span
      aria-hidden="true"
      className="flex size-10 shrink-0 items-center justify-center rounded-full bg-loam-100 font-black text-loam-800"
    >
      {initials || '?'}
    </span>
  );
}
