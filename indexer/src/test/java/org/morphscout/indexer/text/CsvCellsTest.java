package org.morphscout.indexer.text;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringWriter;
import org.junit.jupiter.api.Test;

class CsvCellsTest {
  @Test
  void formulaStartsGetAQuoteAsOwaspAdvises() {
    // The leading characters from the OWASP "CSV Injection" page: =, +, -, @, tab (0x09), carriage return (0x0D).
    for (String cell : new String[] {"=1+1", "+1", "-1", "@SUM(A1)", "\tx", "\rx", "=HYPERLINK(\"a\",\"b\")"}) {
      assertThat(CsvCells.safe(cell)).isEqualTo("'" + cell);
    }
    for (String cell : new String[] {"", "a=b", "/photos/a.jpg", "'=already", " =x", "1-2"}) {
      assertThat(CsvCells.safe(cell)).isEqualTo(cell);
    }
    assertThat(CsvCells.safe(null)).isNull();
  }

  @Test
  void numbersStayNumbers() {
    assertThat(CsvCells.cell(-3.5)).isEqualTo(-3.5);
    assertThat(CsvCells.cell(-7L)).isEqualTo(-7L);
  }

  @Test
  void printerAppliesTheRuleToHeaderAndEveryCell() {
    StringWriter out = new StringWriter();
    try (CsvCells.Printer p = CsvCells.printer(out, "a", "=b")) {
      p.row("@x", -1.5);
      p.row(java.util.List.of("-y", "plain"));
    }
    assertThat(out.toString()).isEqualTo("a,'=b\r\n'@x,-1.5\r\n'-y,plain\r\n");
  }
}
