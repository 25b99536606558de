"use client";

import { Button } from "@/components/ui/button";

function download(href: string, fileName: string) {
  const link = document.createElement("a");
  link.href = href;
  link.download = fileName;
  link.click();
}

/** Saves the SVG chart with this id as an SVG or PNG file, drawn in the browser. */
export function ChartExport({ chartId, fileName }: { chartId: string; fileName: string }) {
  const svgText = () => new XMLSerializer().serializeToString(document.getElementById(chartId)!);

  function saveSvg() {
    const url = URL.createObjectURL(new Blob([svgText()], { type: "image/svg+xml" }));
    download(url, `${fileName}.svg`);
    URL.revokeObjectURL(url);
  }

  function savePng() {
    const svg = document.getElementById(chartId) as unknown as SVGSVGElement;
    const { width, height } = svg.viewBox.baseVal;
    const image = new Image();
    image.onload = () => {
      const canvas = document.createElement("canvas");
      canvas.width = width * 2;
      canvas.height = height * 2;
      const context = canvas.getContext("2d")!;
      context.scale(2, 2);
      context.drawImage(image, 0, 0, width, height);
      download(canvas.toDataURL("image/png"), `${fileName}.png`);
    };
    image.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svgText())}`;
  }

  return (
    <div className="flex flex-wrap gap-2">
      <Button tone="secondary" onClick={savePng}>
        Save chart as PNG
      </Button>
      <Button tone="secondary" onClick={saveSvg}>
        Save chart as SVG
      </Button>
    </div>
  );
}
