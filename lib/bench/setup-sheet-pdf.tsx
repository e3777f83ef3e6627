import "server-only";

import { Document, Image, Page, renderToBuffer, StyleSheet, Text, View } from "@react-pdf/renderer";

import { pdfBase, pdfText as plain, qrDataUrl } from "@/lib/pdf/pdf-kit";

import type { SetupSheetData } from "./setup-sheet-data";

const s = {
  ...pdfBase,
  ...StyleSheet.create({
    header: {
      flexDirection: "row",
      justifyContent: "space-between",
      borderBottomWidth: 2,
      borderBottomColor: "#292524",
      paddingBottom: 8,
      marginBottom: 10,
    },
    c1: { width: "40%" },
    c2: { width: "30%", textAlign: "right" },
    c3: { width: "30%", textAlign: "right", fontWeight: "bold" },
  }),
};

function SetupSheet({ data, qr, url, vendorName }: { data: SetupSheetData; qr: string; url: string; vendorName: string }) {
  const t = plain;
  return (
    <Document title={t(`${data.setupName}: setup sheet`)} author={vendorName} creator="Swarfbook">
      <Page size="A4" style={s.page}>
        <View style={s.header}>
          <View style={{ width: "78%" }}>
            <Text style={s.muted}>{t(`${vendorName} · Setup sheet · ${data.versionLabel}`)}</Text>
            <Text style={s.h1}>{t(data.setupName)}</Text>
            <Text>{t(`Machine: ${data.machineName}`)}</Text>
            <Text>{t(`Cutter: ${data.cutterLine}`)}</Text>
            <Text>{t(`Material: ${data.materialLine}`)}</Text>
          </View>
          {/* eslint-disable-next-line jsx-a11y/alt-text -- react-pdf Image has no alt */}
          <Image style={s.qr} src={qr} />
        </View>
        <Text style={s.h2}>{t(`Operation: ${data.operationLabel}`)}</Text>
        <View style={[s.row, s.th]}>
          <Text style={s.c1}>Quantity</Text>
          <Text style={s.c2}>Sheet</Text>
          <Text style={s.c3}>This machine</Text>
        </View>
        {data.rows.map((r) => (
          <View key={r.symbol} style={s.row}>
            <Text style={s.c1}>{t(`${r.symbol} (${r.label.toLowerCase()})`)}</Text>
            <Text style={s.c2}>{t(r.sheetText)}</Text>
            <Text style={s.c3}>{t(`${r.adaptedText}${r.changed ? " (changed)" : ""}`)}</Text>
          </View>
        ))}
        <Text style={{ marginTop: 6 }}>{t(`Stick-out: ${data.stickout}`)}</Text>
        <Text>{t(`Entry: ${data.entryMethod}`)}</Text>
        <Text style={s.h2}>Your changes</Text>
        {data.yourChanges.length ? (
          data.yourChanges.map((line, i) => (
            <Text key={i} style={s.li}>
              {t(`- ${line}`)}
            </Text>
          ))
        ) : (
          <Text>{t("None: the sheet's own depths and the machine's usual stick-out.")}</Text>
        )}
        <Text style={s.h2}>How the numbers were adapted</Text>
        {data.steps.length ? (
          data.steps.map((step, i) => (
            <Text key={i} style={s.li}>
              {t(`${i + 1}. ${step}`)}
            </Text>
          ))
        ) : (
          <Text>{t(data.noStepsNote)}</Text>
        )}
        {data.warnings.length ? (
          <>
            <Text style={s.h2}>Warnings</Text>
            {data.warnings.map((w, i) => (
              <Text key={i} style={s.li}>
                {t(`! ${w}`)}
              </Text>
            ))}
          </>
        ) : null}
        <Text style={s.h2}>Cautions</Text>
        {data.cautions.map((c, i) => (
          <Text key={i} style={s.li}>
            {t(`- ${c}`)}
          </Text>
        ))}
        <Text style={[s.muted, { marginTop: 12 }]}>{t(`Sheet version: ${url}`)}</Text>
      </Page>
    </Document>
  );
}

/** A one-page PDF for the machine: numbers in the setup's units, steps, cautions, QR code to the sheet version. */
export async function renderSetupSheetPdf({
  data,
  versionUrl,
  vendorName,
}: {
  data: SetupSheetData;
  versionUrl: string;
  vendorName: string;
}): Promise<Buffer> {
  const qr = await qrDataUrl(versionUrl);
  return renderToBuffer(<SetupSheet data={data} qr={qr} url={versionUrl} vendorName={vendorName} />);
}
