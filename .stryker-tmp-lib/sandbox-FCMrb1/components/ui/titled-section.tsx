// @ts-nocheck
type TitledSectionProps = { id: string; title: string; className: string; headingClassName?: string; children: React.ReactNode };

/** A section named by its own h2 (aria-labelledby), the shape of most panels. */
export function TitledSection({ id, title, className, headingClassName = "text-base font-semibold", children }: TitledSectionProps) {
  return (
    <section aria-labelledby={id} className={className}>
      <h2 id={id} className={headingClassName}>
        {title}
      </h2>
      {children}
    </section>
  );
}
