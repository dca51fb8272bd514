// The setup sheet document: page 1 what to fit and set, page 2 the curves, how to measure sag and
// where to report it. Cautions come first, before any figure.
import { Document, Page, Text, View } from "@react-pdf/renderer";
import { forceChartGeometry } from "@/lib/charts/force-curve";
import { forkForceChart, rearForceChart } from "@/lib/charts/recommendation-charts";
import { SizingBasis } from "./sections/basis";
import { ForceChart } from "./sections/chart";
import { Clickers } from "./sections/clickers";
import { Cautions, NotesAndReport, SagSteps } from "./sections/guidance";
import { SheetHeader } from "./sections/header";
import { RiderAndBike } from "./sections/rider-bike";
import { ForkCard, ShockCard } from "./sections/springs";
import { sheetDateOf, type SheetData } from "./sheet-data";
import { s } from "./styles";

// Content width of the narrower paper (A4: 595 pt minus margins), split into two columns.
const CHART_WIDTH = 255;

function Footer({ data }: { data: SheetData }) {
  return (
    <View style={s.footer} fixed>
      <Text style={{ maxWidth: 360 }}>{data.shop.footer ?? data.shop.name}</Text>
      <Text
        render={({ pageNumber, totalPages }) =>
          `Request ${data.request.number} · version ${data.version.number} · page ${pageNumber} of ${totalPages}`
        }
      />
    </View>
  );
}

function Watermark() {
  return (
    <>
      <Text style={s.watermark} fixed>
        DRAFT
      </Text>
      {/* Said in words too: the big letters are a picture to a screen reader or a text search. */}
      <Text style={s.draftBanner} fixed>
        DRAFT PREVIEW: not approved, do not set up the bike from this sheet
      </Text>
    </>
  );
}

export function SetupSheet({ data }: { data: SheetData }) {
  const rec = data.recommendation;
  const imperial = data.shop.imperial;
  // Fixed metadata dates (the version's own), so the same version gives the same file.
  const date = sheetDateOf(data.version);
  return (
    <Document
      title={`Setup sheet, request ${data.request.number}, version ${data.version.number}`}
      author={data.shop.name}
      subject={`Suspension setup for ${data.request.riderName}, ${data.request.bikeLabel}`}
      creator="Sagwise"
      producer="Sagwise"
      language="en"
      creationDate={date}
      modificationDate={date}
    >
      <Page size={data.shop.paperSize} style={s.page}>
        {data.draft ? <Watermark /> : null}
        <SheetHeader data={data} />
        <RiderAndBike data={data} />
        <Cautions />
        <Text style={s.h2}>Springs, preload and sag</Text>
        <View style={s.row}>
          <ForkCard
            front={rec.front}
            imperial={imperial}
            currentNmm={rec.input.currentSprings?.forkRateNmm}
            forkOil={data.request.forkOil}
          />
          <ShockCard
            rear={rec.rear}
            collarPitchMm={rec.input.bike.rear.collarPitchMm}
            imperial={imperial}
            currentNmm={rec.input.currentSprings?.shockRateNmm}
          />
        </View>
        <SizingBasis rec={rec} />
        <Clickers clickers={rec.clickers} />
        <Footer data={data} />
      </Page>
      <Page size={data.shop.paperSize} style={s.page}>
        {data.draft ? <Watermark /> : null}
        <Text style={s.h2}>Force against travel</Text>
        <Text style={s.small}>
          How hard the suspension pushes back as it compresses with this setup; dashed vertical lines mark the expected
          sag.
        </Text>
        <View style={[s.row, { marginTop: 4 }]}>
          <ForceChart title="Fork" geometry={forceChartGeometry(forkForceChart(rec))} width={CHART_WIDTH} />
          <ForceChart
            title="Shock, at the rear wheel"
            geometry={forceChartGeometry(rearForceChart(rec))}
            width={CHART_WIDTH}
          />
        </View>
        <SagSteps />
        <NotesAndReport notes={data.version.notesForRider} reportUrl={data.reportUrl} approved={!data.draft} />
        <Footer data={data} />
      </Page>
    </Document>
  );
}
