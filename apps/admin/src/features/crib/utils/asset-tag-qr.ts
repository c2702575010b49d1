import { ASSET_TAG_QR_ERROR_CORRECTION, qrDrawing, type QrDrawing } from '@chuckkey/core';
import QRCode from 'qrcode';

/** The QR symbol of an asset tag: its text is exactly the tag, so a scan reads back what the crib stores. */
export function assetTagQr(assetTag: string): QrDrawing {
  return qrDrawing(QRCode.create(assetTag, { errorCorrectionLevel: ASSET_TAG_QR_ERROR_CORRECTION }).modules);
}
