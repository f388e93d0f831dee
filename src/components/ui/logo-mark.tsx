/**
 * The Grain & Edge mark: an eyepiece holding a few grains of steel, with a
 * blade's edge, in ember, entering the field of view. Drawn for this product.
 */
export function LogoMark({ className, title }: { className?: string; title?: string }) {
  return (
    <svg
      viewBox="0 0 32 32"
      className={className}
      role={title ? "img" : undefined}
      aria-hidden={title ? undefined : true}
      focusable="false"
    >
      {title ? <title>{title}</title> : null}
      <circle cx="16" cy="16" r="14.5" fill="#1a1714" />
      <path
        d="M9 3.9 L12.2 10.4 L4 13.2 M12.2 10.4 L20.6 8.9 L22.4 2.8 M4.6 21.6 L12.4 22.1 L15.2 29.5 M12.4 22.1 L21 23.4 L25.6 27.3"
        fill="none"
        stroke="#6b625a"
        strokeWidth="1.2"
        strokeLinejoin="round"
      />
      <path d="M5.2 16 L29.2 10 A14.5 14.5 0 0 1 29.2 22 Z" fill="#f26d1d" />
      <path d="M5.2 16 L29.2 10" stroke="#ffd4b0" strokeWidth="1.2" strokeLinecap="round" />
      <circle cx="16" cy="16" r="14.5" fill="none" stroke="#c4bbb0" strokeWidth="1.5" />
    </svg>
  );
}
