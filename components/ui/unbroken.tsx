/**
 * Text whose numbers never break at a dash ("serials 22-1546 to 22-2610", "recorded on CV-3067-C"): it may wrap at
 * its spaces only, so a factory number or a serial is never split into what reads as two numbers.
 */
export function Unbroken({ text }: { text: string }) {
  const words = text.split(" ");
  return (
    <>
      {words.map((word, i) => (
        // The space stays outside the unbreakable word, where a line may break.
        <span key={`${i}-${word}`}>
          <span className="whitespace-nowrap">{word}</span>
          {i < words.length - 1 ? " " : ""}
        </span>
      ))}
    </>
  );
}
