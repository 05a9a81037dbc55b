import { useEffect, useState } from "react";
import { Group, Image as KonvaImage } from "react-konva";
import type { Background } from "~/lib/editor/background";

/**
 * The site photo under the plan, placed by the document's background field: its top-left pixel at
 * (x, y) m, each pixel metresPerPixel wide, turned by rotationDeg. Sits inside the plan group
 * (Y up), hence the negative Y scale that keeps the photo the right way up.
 */
export function PhotoImage({
  url,
  background,
  onSize,
}: {
  url: string;
  background: Background;
  onSize?(w: number, h: number): void;
}) {
  const [image, setImage] = useState<HTMLImageElement | null>(null);
  useEffect(() => {
    const img = new window.Image();
    let live = true;
    img.onload = () => {
      if (!live) return;
      setImage(img);
      onSize?.(img.naturalWidth, img.naturalHeight);
    };
    img.src = url;
    return () => {
      live = false;
    };
    // onSize is a callback from the parent; the photo reloads only when its address changes.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [url]);
  if (!image || background.hidden) return null;
  return (
    <Group
      x={background.x}
      y={background.y}
      rotation={background.rotationDeg}
      scaleX={background.metresPerPixel}
      scaleY={-background.metresPerPixel}
      opacity={background.opacity}
      listening={false}
    >
      <KonvaImage name="site-photo" image={image} perfectDrawEnabled={false} />
    </Group>
  );
}
