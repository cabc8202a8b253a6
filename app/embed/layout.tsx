// Embeds: no site chrome and nothing that reads or sets cookies; the only routes other sites may frame.
export default function EmbedLayout({ children }: { children: React.ReactNode }) {
  return <div className="bg-white text-ink">{children}</div>;
}
