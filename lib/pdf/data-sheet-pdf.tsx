import "server-only";

import { Document, Image, Page, renderToBuffer, Text, View } from "@react-pdf/renderer";

import type { DataSheetData } from "@/lib/library/data-sheet-data";

import { BrandBand, Cautions, CutterSpecs, ds, OperationsTable, PageFooter, type Branding } from "./data-sheet-parts";
import { qrDataUrl, pdfText as t } from "./pdf-kit";

function Card({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <View style={[ds.card, { width: "32.5%" }]}>
      <Text style={ds.cardTitle}>{title}</Text>
      {children}
    </View>
  );
}

function DataSheet({ data, branding, qr, printedOn }: { data: DataSheetData; branding: Branding; qr: string; printedOn: string }) {
  return (
    <Document title={t(`${data.title}, version ${data.number}`)} author={t(branding.vendorName)} creator="Swarfbook">
      <Page size="A4" style={[ds.page, { paddingBottom: 40 }]}>
        <BrandBand branding={branding} label={`Recipe sheet · ${data.slug} · version ${data.number}`} />
        <View style={{ flexDirection: "row", justifyContent: "space-between", marginBottom: 8 }}>
          <View style={{ width: "80%" }}>
            <Text style={ds.h1}>{t(data.title)}</Text>
            <Text style={{ marginTop: 2 }}>{t(data.summary)}</Text>
            <Text style={[ds.muted, { marginTop: 4 }]}>{t(`Version ${data.number} · ${data.status}`)}</Text>
          </View>
          <View style={{ alignItems: "center" }}>
            {/* eslint-disable-next-line jsx-a11y/alt-text -- react-pdf Image has no alt */}
            <Image style={ds.qr} src={qr} />
            <Text style={ds.alt}>This version online</Text>
          </View>
        </View>
        <View style={{ flexDirection: "row", justifyContent: "space-between", marginBottom: 6 }}>
          <Card title="Cutter">
            <CutterSpecs cutter={data.cutter} />
          </Card>
          <Card title="Material">
            <Text style={ds.bold}>{t(data.material.name)}</Text>
            {data.material.lines.map((l, i) => (
              <Text key={i} style={ds.small}>
                {t(l)}
              </Text>
            ))}
          </Card>
          <Card title="Reference machine class">
            <Text style={ds.bold}>{t(data.machineClass.name)}</Text>
            {data.machineClass.lines.map((l, i) => (
              <Text key={i} style={ds.small}>
                {t(l)}
              </Text>
            ))}
          </Card>
        </View>
        <Text style={ds.h2}>Operations (metric, imperial below)</Text>
        <OperationsTable operations={data.operations} />
        <Cautions cautions={data.cautions} />
        <PageFooter left={`${data.url} · version ${data.number} · printed ${printedOn}`} />
      </Page>
    </Document>
  );
}

/** One sheet version on paper: branding, cutter card, operations in both unit systems, cautions, QR code to the version. */
export async function renderDataSheetPdf({
  data,
  branding,
  printedOn,
}: {
  data: DataSheetData;
  branding: Branding;
  printedOn: string;
}): Promise<Buffer> {
  return renderToBuffer(<DataSheet data={data} branding={branding} qr={await qrDataUrl(data.url)} printedOn={printedOn} />);
}
