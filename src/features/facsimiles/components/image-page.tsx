export interface ImagePageProps {
  url: string;
  zoom: number;
  size: { width: number; height: number } | null;
  onSize: (size: { width: number; height: number }) => void;
  alt: string;
}

/** An image facsimile, shown at its pixel size times the zoom. */
export function ImagePage({ url, zoom, size, onSize, alt }: ImagePageProps) {
  return (
    <img
      src={url}
      alt={alt}
      onLoad={(event) => onSize({ width: event.currentTarget.naturalWidth, height: event.currentTarget.naturalHeight })}
      style={size ? { width: Math.round(size.width * zoom), height: Math.round(size.height * zoom), maxWidth: 'none' } : undefined}
      className="mx-auto block bg-white shadow-leaf"
      draggable={false}
    />
  );
}
