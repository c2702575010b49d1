import type { CribItem } from '@chuckkey/core';
import { assetTagQr } from '../utils/asset-tag-qr';
import './asset-label-sheet.css';

export const LABELS_PER_SHEET = 24;

export interface LabelledTool {
  id: string;
  name: string;
  assetTag: string;
}

/** The tools that can carry a label: those with an asset tag. */
export function labelledTools(items: readonly CribItem[]): LabelledTool[] {
  return items.flatMap((item) => (item.kind === 'tool' && item.assetTag ? [{ id: item.id, name: item.name, assetTag: item.assetTag }] : []));
}

/** The QR code drawn as vectors, so it prints sharp at any printer resolution. */
export function AssetTagQr({ assetTag, className }: { assetTag: string; className?: string }) {
  const { size, runs } = assetTagQr(assetTag);
  return (
    <svg
      viewBox={`0 0 ${size} ${size}`}
      className={className}
      shapeRendering="crispEdges"
      role="img"
      aria-label={`QR code of asset tag ${assetTag}`}
    >
      <rect width={size} height={size} fill="#ffffff" />
      {runs.map((run) => (
        <rect key={`${run.x}-${run.y}`} x={run.x} y={run.y} width={run.width} height={1} fill="#000000" />
      ))}
    </svg>
  );
}

export function AssetLabel({ tool, shopName }: { tool: LabelledTool; shopName: string | undefined }) {
  return (
    <li className="asset-label">
      <AssetTagQr assetTag={tool.assetTag} className="asset-label-qr" />
      <div className="asset-label-text">
        <span className="asset-label-name">{tool.name}</span>
        <span className="asset-label-tag">{tool.assetTag}</span>
        {shopName && <span className="asset-label-shop">{shopName}</span>}
      </div>
    </li>
  );
}

/**
 * The page margins the label block is laid out for. @page cannot be limited to one page of the app
 * by a selector, and a bundled style sheet stays once loaded; this element leaves with the sheets,
 * so every other page prints with the browser's own margins again.
 */
const pageMargins = '@page { margin: 7mm; }';

/** Sheets of 24 labels, each sheet a printed page of its own. */
export function AssetLabelSheet({ tools, shopName }: { tools: readonly LabelledTool[]; shopName: string | undefined }) {
  const sheets: LabelledTool[][] = [];
  for (let start = 0; start < tools.length; start += LABELS_PER_SHEET) sheets.push(tools.slice(start, start + LABELS_PER_SHEET));
  return (
    <div className="-mx-4 overflow-x-auto px-4 print:m-0 print:overflow-visible print:p-0">
      <style>{pageMargins}</style>
      {sheets.map((sheet, index) => (
        <ul key={index} className="asset-label-page" aria-label={sheets.length > 1 ? `Label sheet ${index + 1} of ${sheets.length}` : 'Label sheet'}>
          {sheet.map((tool) => (
            <AssetLabel key={tool.id} tool={tool} shopName={shopName} />
          ))}
        </ul>
      ))}
    </div>
  );
}
