import "server-only";

import { Document, Image, Page, renderToBuffer, Text, View } from "@react-pdf/renderer";

import type { DataSheetData, DataSheetOperation } from "@/lib/library/data-sheet-data";

import { BrandBand, Cautions, CutterSpecs, ds, OperationsTable, PageFooter, type Branding } from "./data-sheet-parts";
import { qrDataUrl, pdfText as t } from "./pdf-kit";

export type CutterSheetEntry = {
  title: string;
  material: string;
  machineClass: string;
  number: number;
  published: string;
  url: string;
  operations: DataSheetOperation[];
  cautions: string[];
};
export type CutterDataSheetData = {
  cutter: DataSheetData["cutter"];
  shortUrl: string;
  sheets: CutterSheetEntry[];
  standardCautions: string[];
};

function CutterDataSheet({
  data,
  branding,
  qr,
  printedOn,
}: {
  data: CutterDataSheetData;
  branding: Branding;
  qr: string;
  printedOn: string;
}) {
  return (
    <Document title={t(`${data.cutter.sku}: cutter data sheet`)} author={t(branding.vendorName)} creator="Swarfbook">
      <Page size="A4" style={[ds.page, { paddingBottom: 40, fontSize: 8 }]}>
        <BrandBand branding={branding} label={`Cutter data sheet · ${data.cutter.sku}`} />
        <View style={{ flexDirection: "row", justifyContent: "space-between", marginBottom: 6 }}>
          <View style={[ds.card, { width: "80%" }]}>
            <CutterSpecs cutter={data.cutter} />
          </View>
          <View style={{ alignItems: "center" }}>
            {/* eslint-disable-next-line jsx-a11y/alt-text -- react-pdf Image has no alt */}
            <Image style={ds.qr} src={qr} />
            <Text style={ds.alt}>{t(data.shortUrl.replace(/^https?:\/\//, ""))}</Text>
          </View>
        </View>
        <Text style={ds.muted}>
          {t(`${data.sheets.length} current published sheet${data.sheets.length === 1 ? "" : "s"}; metric values, imperial below.`)}
        </Text>
        {data.sheets.length === 0 ? <Text style={{ marginTop: 8 }}>No sheet is published for this cutter yet.</Text> : null}
        {data.sheets.map((s) => (
          <View key={s.url} style={{ marginTop: 8 }} wrap={false}>
            <Text style={[ds.bold, { fontSize: 9 }]}>{t(`${s.material} · ${s.machineClass}`)}</Text>
            <Text style={ds.alt}>{t(`${s.title} · version ${s.number} · published ${s.published} · ${s.url}`)}</Text>
            <OperationsTable operations={s.operations} />
            {s.cautions.map((c, i) => (
              <Text key={i} style={ds.small}>
                {t(`⚠ ${c}`)}
              </Text>
            ))}
          </View>
        ))}
        <Cautions cautions={data.standardCautions} title="Before every cut" />
        <PageFooter left={`${data.shortUrl} · printed ${printedOn}`} />
      </Page>
    </Document>
  );
}

/** Every current published sheet of one cutter, compact, for the box insert or the wall by the machine. */
export async function renderCutterDataSheetPdf({
  data,
  branding,
  printedOn,
}: {
  data: CutterDataSheetData;
  branding: Branding;
  printedOn: string;
}): Promise<Buffer> {
  return renderToBuffer(<CutterDataSheet data={data} branding={branding} qr={await qrDataUrl(data.shortUrl)} printedOn={printedOn} />);
}
